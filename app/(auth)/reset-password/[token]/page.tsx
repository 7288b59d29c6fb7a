import type { Metadata } from "next";
import { AuthCard } from "@/components/auth/auth-card";
import { ResetPasswordForm } from "@/components/auth/reset-password-form";
import { TextLink } from "@/components/ui/text-link";
import { linkTokenField } from "@/lib/validations/fields";

export const metadata: Metadata = { title: "Choose a new password" };

export default async function ResetPasswordPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const parsed = linkTokenField.safeParse(token);

  return (
    <AuthCard title="Choose a new password" footer={<TextLink href="/sign-in">Back to sign in</TextLink>}>
      {parsed.success ? (
        <ResetPasswordForm token={parsed.data} />
      ) : (
        <div className="flex flex-col gap-3 text-sm">
          <p role="alert" className="font-medium text-ember-700">{parsed.error.issues[0]?.message ?? "This link is not valid."}</p>
          <TextLink href="/forgot-password">Ask for a new link</TextLink>
        </div>
      )}
    </AuthCard>
  );
}
