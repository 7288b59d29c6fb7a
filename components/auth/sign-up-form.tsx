"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { FormAlert } from "@/components/ui/form-alert";
import { useToast } from "@/components/toast/toast-provider";
import { apiFetch, errorMessage } from "@/lib/client/api-fetch";
import { signInErrorMessage } from "@/lib/client/sign-in-error";
import { signUpSchema } from "@/lib/validations/account";
import { PasswordField } from "./password-field";

/** Creates a shop with the new person as its owner, then signs them in. */
export function SignUpForm() {
  const router = useRouter();
  const toast = useToast();
  const [failure, setFailure] = useState<string | null>(null);
  const form = useForm({
    resolver: zodResolver(signUpSchema),
    defaultValues: { name: "", email: "", password: "", shopName: "" },
  });
  const { errors, isSubmitting } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setFailure(null);
    try {
      await apiFetch("/api/account/signup", { method: "POST", body: values });
    } catch (err) {
      setFailure(errorMessage(err));
      return;
    }
    const res = await signIn("credentials", { email: values.email, password: values.password, redirect: false });
    if (!res || res.error) {
      setFailure(`Your shop was created, but signing in failed: ${signInErrorMessage(res?.error)}`);
      return;
    }
    toast.success(`Welcome to ${values.shopName}.`);
    router.push("/projects");
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4" aria-label="Create a shop">
      <TextField id="sign-up-name" label="Your name" autoComplete="name" error={errors.name?.message} {...form.register("name")} />
      <TextField id="sign-up-email" label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...form.register("email")} />
      <PasswordField
        id="sign-up-password"
        label="Password"
        autoComplete="new-password"
        hint="At least 8 characters."
        error={errors.password?.message}
        {...form.register("password")}
      />
      <TextField
        id="sign-up-shop"
        label="Shop name"
        autoComplete="organization"
        hint="Your studio or team; you can invite people after."
        error={errors.shopName?.message}
        {...form.register("shopName")}
      />
      <FormAlert message={failure} />
      <Button type="submit" busy={isSubmitting}>
        Create shop and sign in
      </Button>
    </form>
  );
}
