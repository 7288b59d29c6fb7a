"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { FormAlert } from "@/components/ui/form-alert";
import { signInErrorMessage } from "@/lib/client/sign-in-error";
import { signInSchema } from "@/lib/validations/account";
import { PasswordField } from "./password-field";

/** E-mail and password through next-auth's credentials provider; stays on the page with a clear message on failure. */
export function SignInForm({ callbackUrl = "/projects", notice }: { callbackUrl?: string; notice?: string | null }) {
  const router = useRouter();
  const [failure, setFailure] = useState<string | null>(null);
  const form = useForm({ resolver: zodResolver(signInSchema), defaultValues: { email: "", password: "" } });
  const { errors, isSubmitting } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setFailure(null);
    const res = await signIn("credentials", { email: values.email, password: values.password, redirect: false });
    if (!res || res.error || !res.ok) {
      setFailure(signInErrorMessage(res?.error));
      form.setFocus("password");
      return;
    }
    router.push(callbackUrl);
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4" aria-label="Sign in">
      <FormAlert message={notice} tone="success" />
      <TextField id="sign-in-email" label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...form.register("email")} />
      <PasswordField
        id="sign-in-password"
        label="Password"
        autoComplete="current-password"
        error={errors.password?.message}
        {...form.register("password")}
      />
      <FormAlert message={failure} />
      <Button type="submit" busy={isSubmitting}>
        Sign in
      </Button>
    </form>
  );
}
