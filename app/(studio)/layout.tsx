import type { ReactNode } from "react";
import { QueryProvider } from "@/components/providers/query-provider";
import { NoShopNotice } from "@/components/studio/no-shop-notice";
import { SafetyFooter } from "@/components/studio/safety-footer";
import { SkipLink } from "@/components/studio/skip-link";
import { StudioHeader } from "@/components/studio/studio-header";
import { getStudioSession } from "@/components/studio/studio-session";
import { describeMe } from "@/lib/accounts/me";

/** Signed-in area: header with shop and role, the screen, and the workshop cautions below. */
export default async function StudioLayout({ children }: { children: ReactNode }) {
  const session = await getStudioSession();
  const me = session ? await describeMe(session) : null;

  return (
    <QueryProvider>
      <div className="flex min-h-dvh flex-col bg-kraft-50">
        <SkipLink />
        <StudioHeader initialMe={me ?? undefined} />
        <main id="main" tabIndex={-1} className="mx-auto w-full max-w-6xl flex-1 px-4 py-8 focus:outline-none sm:px-6">
          {session ? children : <NoShopNotice />}
        </main>
        <SafetyFooter />
      </div>
    </QueryProvider>
  );
}
