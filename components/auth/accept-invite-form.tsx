"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { FormAlert } from "@/components/ui/form-alert";
import { useToast } from "@/components/toast/toast-provider";
import { apiFetch, errorMessage } from "@/lib/client/api-fetch";
import { ROLE_LABELS, type InvitationInfo } from "@/lib/client/api-types";
import { signInErrorMessage } from "@/lib/client/sign-in-error";
import { newPasswordField, requiredText } from "@/lib/validations/fields";
import { invitationAcceptSchema } from "@/lib/validations/members";
import { PasswordField } from "./password-field";

/** A new account also needs a name and a password that meets the new-password rules. */
const newAccountSchema = invitationAcceptSchema.extend({ name: requiredText("Name", 120), password: newPasswordField });

/**
 * Accepts an invitation: a new person picks a name and password (the account is created), someone who already has
 * an account proves it with their password. Both are then signed in and land in the shop.
 */
export function AcceptInviteForm({ token, invitation }: { token: string; invitation: InvitationInfo }) {
  const router = useRouter();
  const toast = useToast();
  const [failure, setFailure] = useState<string | null>(null);
  const schema = invitation.accountExists ? invitationAcceptSchema : newAccountSchema;
  const form = useForm<z.input<typeof invitationAcceptSchema>, unknown, z.output<typeof invitationAcceptSchema>>({
    resolver: zodResolver(schema),
    defaultValues: { name: "", password: "" },
  });
  const { errors, isSubmitting } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setFailure(null);
    let accepted: { shopId?: string; shop?: { id?: string } } | undefined;
    try {
      accepted = await apiFetch(`/api/invitations/${encodeURIComponent(token)}/accept`, {
        method: "POST",
        body: invitation.accountExists ? { password: values.password } : { name: values.name, password: values.password },
      });
    } catch (err) {
      setFailure(errorMessage(err));
      return;
    }
    const res = await signIn("credentials", { email: invitation.email, password: values.password, redirect: false });
    if (!res || res.error) {
      setFailure(`You joined ${invitation.shopName}, but signing in failed: ${signInErrorMessage(res?.error)}`);
      return;
    }
    const shopId = accepted?.shopId ?? accepted?.shop?.id;
    if (shopId) {
      try {
        await apiFetch("/api/me/shop", { method: "POST", body: { shopId } });
      } catch {
        // Signed in; the shop switcher in the header still reaches the new shop.
      }
    }
    toast.success(`Welcome to ${invitation.shopName}.`);
    router.push("/projects");
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4" aria-label="Accept invitation">
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 border border-dashed border-kraft-500 bg-kraft-50 px-4 py-3 text-sm">
        <dt className="text-kraft-700">Shop</dt>
        <dd className="font-bold" data-testid="invite-shop">{invitation.shopName}</dd>
        <dt className="text-kraft-700">Role</dt>
        <dd className="font-bold" data-testid="invite-role">{ROLE_LABELS[invitation.role] ?? invitation.role}</dd>
        <dt className="text-kraft-700">E-mail</dt>
        <dd className="break-all">{invitation.email}</dd>
      </dl>
      {invitation.accountExists ? (
        <p className="text-sm text-kraft-700">You already have a Peelform account. Enter its password to join this shop.</p>
      ) : (
        <TextField id="invite-name" label="Your name" autoComplete="name" error={errors.name?.message} {...form.register("name")} />
      )}
      <PasswordField
        id="invite-password"
        label={invitation.accountExists ? "Your password" : "Choose a password"}
        autoComplete={invitation.accountExists ? "current-password" : "new-password"}
        hint={invitation.accountExists ? undefined : "At least 8 characters."}
        error={errors.password?.message}
        {...form.register("password")}
      />
      <FormAlert message={failure} />
      <Button type="submit" busy={isSubmitting}>
        {invitation.accountExists ? "Join the shop" : "Create account and join"}
      </Button>
    </form>
  );
}
