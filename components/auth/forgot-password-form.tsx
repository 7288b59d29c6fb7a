"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { FormAlert } from "@/components/ui/form-alert";
import { apiFetch, errorMessage } from "@/lib/client/api-fetch";
import { passwordResetRequestSchema } from "@/lib/validations/account";

/** Asks for a reset link. The answer is the same whether or not the account exists (no account probing). */
export function ForgotPasswordForm() {
  const [sentTo, setSentTo] = useState<string | null>(null);
  const [failure, setFailure] = useState<string | null>(null);
  const form = useForm({ resolver: zodResolver(passwordResetRequestSchema), defaultValues: { email: "" } });
  const { errors, isSubmitting } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setFailure(null);
    try {
      await apiFetch("/api/account/password-reset", { method: "POST", body: values });
      setSentTo(values.email);
    } catch (err) {
      setFailure(errorMessage(err));
    }
  });

  if (sentTo) {
    return (
      <FormAlert
        tone="success"
        message={`If an account exists for ${sentTo}, a link to choose a new password is on its way. It works for a limited time.`}
      />
    );
  }

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4" aria-label="Request a password reset link">
      <TextField id="forgot-email" label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...form.register("email")} />
      <FormAlert message={failure} />
      <Button type="submit" busy={isSubmitting}>
        Send reset link
      </Button>
    </form>
  );
}
