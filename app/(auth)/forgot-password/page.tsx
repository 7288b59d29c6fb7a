import type { Metadata } from "next";
import { AuthCard } from "@/components/auth/auth-card";
import { ForgotPasswordForm } from "@/components/auth/forgot-password-form";
import { TextLink } from "@/components/ui/text-link";

export const metadata: Metadata = { title: "Forgot password" };

export default function ForgotPasswordPage() {
  return (
    <AuthCard
      title="Forgot your password?"
      lead="Enter the e-mail you sign in with and we will send a link to choose a new one."
      footer={<TextLink href="/sign-in">Back to sign in</TextLink>}
    >
      <ForgotPasswordForm />
    </AuthCard>
  );
}
