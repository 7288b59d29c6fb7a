"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { FormAlert } from "@/components/ui/form-alert";
import { apiFetch, errorMessage } from "@/lib/client/api-fetch";
import { passwordResetConfirmSchema } from "@/lib/validations/account";
import { PasswordField } from "./password-field";

const passwordOnly = passwordResetConfirmSchema.pick({ password: true });

/** Sets a new password with the token from the e-mailed link, then sends the person to sign in. */
export function ResetPasswordForm({ token }: { token: string }) {
  const router = useRouter();
  const [failure, setFailure] = useState<string | null>(null);
  const form = useForm({ resolver: zodResolver(passwordOnly), defaultValues: { password: "" } });
  const { errors, isSubmitting } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setFailure(null);
    try {
      await apiFetch("/api/account/password-reset/confirm", { method: "POST", body: { token, password: values.password } });
    } catch (err) {
      setFailure(errorMessage(err));
      return;
    }
    router.push("/sign-in?notice=reset");
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4" aria-label="Choose a new password">
      <PasswordField
        id="reset-password"
        label="New password"
        autoComplete="new-password"
        hint="At least 8 characters."
        error={errors.password?.message}
        {...form.register("password")}
      />
      <FormAlert message={failure} />
      <Button type="submit" busy={isSubmitting}>
        Save new password
      </Button>
    </form>
  );
}
