"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { useToast } from "@/components/toast/toast-provider";
import { errorMessage } from "@/lib/client/api-fetch";
import { ROLE_LABELS, ROLES } from "@/lib/client/api-types";
import { useInviteMember } from "@/lib/client/use-members";
import { invitationCreateSchema } from "@/lib/validations/members";

const roleOptions = ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }));

/** Invite someone by e-mail with a role (POST /api/shop/invitations); the link goes out by e-mail. */
export function InviteForm() {
  const toast = useToast();
  const invite = useInviteMember();
  const form = useForm({ resolver: zodResolver(invitationCreateSchema), defaultValues: { email: "", role: "designer" as const } });
  const { errors, isSubmitting } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    try {
      await invite.mutateAsync(values);
      toast.success(`Invitation sent to ${values.email}.`);
      form.reset({ email: "", role: values.role });
      form.setFocus("email");
    } catch (err) {
      toast.error(`Could not invite: ${errorMessage(err)}`);
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4" aria-label="Invite a member">
      <TextField id="invite-email" label="E-mail" type="email" autoComplete="off" error={errors.email?.message} {...form.register("email")} />
      <SelectField id="invite-role" label="Role" options={roleOptions} error={errors.role?.message} {...form.register("role")} />
      <Button type="submit" busy={isSubmitting}>
        Send invitation
      </Button>
    </form>
  );
}
