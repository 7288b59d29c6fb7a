import type { Metadata } from "next";
import { getServerSession } from "next-auth";
import { redirect } from "next/navigation";
import { AuthCard } from "@/components/auth/auth-card";
import { SignUpForm } from "@/components/auth/sign-up-form";
import { TextLink } from "@/components/ui/text-link";
import { authOptions } from "@/lib/auth/auth-options";

export const metadata: Metadata = { title: "Create a shop" };

export default async function SignUpPage() {
  if (await getServerSession(authOptions)) redirect("/projects");
  return (
    <AuthCard
      title="Create a shop"
      lead="Start a shop for your team. You will be its owner."
      footer={
        <span>
          Already have an account? <TextLink href="/sign-in">Sign in</TextLink>
        </span>
      }
    >
      <SignUpForm />
    </AuthCard>
  );
}
