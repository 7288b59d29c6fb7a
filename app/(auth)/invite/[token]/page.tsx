import type { Metadata } from "next";
import { AuthCard } from "@/components/auth/auth-card";
import { InvitationLoader } from "@/components/auth/invitation-loader";
import { TextLink } from "@/components/ui/text-link";
import { linkTokenField } from "@/lib/validations/fields";

export const metadata: Metadata = { title: "Join a shop" };

export default async function InvitePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const parsed = linkTokenField.safeParse(token);

  return (
    <AuthCard title="You are invited" lead="Join a Peelform shop and work on its builds.">
      {parsed.success ? (
        <InvitationLoader token={parsed.data} />
      ) : (
        <div className="flex flex-col gap-3 text-sm">
          <p role="alert" className="font-medium text-ember-700">{parsed.error.issues[0]?.message ?? "This link is not valid."}</p>
          <TextLink href="/sign-in">Go to sign in</TextLink>
        </div>
      )}
    </AuthCard>
  );
}
