import { getServerSession } from "next-auth";
import { redirect } from "next/navigation";
import { Wordmark } from "@/components/brand/wordmark";
import { ProductIntro } from "@/components/landing/product-intro";
import { SafetyFooter } from "@/components/studio/safety-footer";
import { TextLink } from "@/components/ui/text-link";
import { authOptions } from "@/lib/auth/auth-options";

export default async function LandingPage() {
  const session = await getServerSession(authOptions);
  if (session) redirect("/projects");

  return (
    <div className="grid-paper flex min-h-dvh flex-col">
      <header className="mx-auto flex w-full max-w-5xl items-center justify-between px-6 py-5">
        <Wordmark />
        <nav aria-label="Account" className="flex gap-4 text-sm">
          <TextLink href="/sign-in">Sign in</TextLink>
          <TextLink href="/sign-up">Sign up</TextLink>
        </nav>
      </header>
      <main id="main" className="flex-1">
        <ProductIntro />
      </main>
      <SafetyFooter />
    </div>
  );
}
