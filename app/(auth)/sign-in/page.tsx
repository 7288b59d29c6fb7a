import type { Metadata } from "next";
import { getServerSession } from "next-auth";
import { redirect } from "next/navigation";
import { AuthCard } from "@/components/auth/auth-card";
import { SignInForm } from "@/components/auth/sign-in-form";
import { TextLink } from "@/components/ui/text-link";
import { appUrl } from "@/lib/auth/auth-config";
import { authOptions } from "@/lib/auth/auth-options";
import { safeCallbackUrl } from "@/lib/client/safe-callback";

export const metadata: Metadata = { title: "Sign in" };

const notices: Record<string, string> = {
  reset: "Your password was changed. Sign in with the new one.",
};

export default async function SignInPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const params = await searchParams;
  const callbackUrl = safeCallbackUrl(params.callbackUrl, appUrl());
  if (await getServerSession(authOptions)) redirect(callbackUrl);
  const noticeKey = typeof params.notice === "string" ? params.notice : "";

  return (
    <AuthCard
      title="Sign in"
      lead="Welcome back to the pattern bench."
      footer={
        <div className="flex flex-wrap justify-between gap-2">
          <TextLink href="/forgot-password">Forgot your password?</TextLink>
          <span>
            New here? <TextLink href="/sign-up">Create a shop</TextLink>
          </span>
        </div>
      }
    >
      <SignInForm callbackUrl={callbackUrl} notice={notices[noticeKey] ?? null} />
    </AuthCard>
  );
}
