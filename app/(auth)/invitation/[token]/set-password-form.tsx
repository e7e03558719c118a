"use client";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { signIn } from "next-auth/react";
import { acceptInvitationSchema, type AcceptInvitationInput } from "@/app/api/invitations/accept/accept-invitation.schema";
import { sendJson } from "@/lib/http/send-json";
import { Field } from "@/components/ui/field";
import { buttonStyles, inputStyles } from "@/components/ui/button-styles";

export function SetPasswordForm({ token, email }: { token: string; email: string }) {
  const [error, setError] = useState<string>();
  const { register, handleSubmit, formState, setError: setFieldError } = useForm<AcceptInvitationInput>({
    resolver: zodResolver(acceptInvitationSchema),
    defaultValues: { token },
  });

  const onSubmit = handleSubmit(async (values) => {
    setError(undefined);
    const result = await sendJson("/api/invitations/accept", "POST", values);
    if (!result.ok) {
      setError(result.error);
      for (const [field, message] of Object.entries(result.fields ?? {})) {
        if (field === "password" || field === "confirm") setFieldError(field, { message });
      }
      return;
    }
    await signIn("credentials", { email, password: values.password, redirect: false });
    window.location.assign("/");
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      {error && (
        <p role="alert" className="rounded-lg bg-danger-soft px-3 py-2 text-sm text-danger">
          {error}
        </p>
      )}
      <input type="hidden" {...register("token")} />
      <Field id="password" label="New password" hint="At least 10 characters." error={formState.errors.password?.message}>
        <input id="password" type="password" autoComplete="new-password" className={inputStyles} aria-invalid={!!formState.errors.password} {...register("password")} />
      </Field>
      <Field id="confirm" label="Repeat the password" error={formState.errors.confirm?.message}>
        <input id="confirm" type="password" autoComplete="new-password" className={inputStyles} aria-invalid={!!formState.errors.confirm} {...register("confirm")} />
      </Field>
      <button type="submit" className={buttonStyles.primary} disabled={formState.isSubmitting}>
        {formState.isSubmitting ? "Saving…" : "Set password and sign in"}
      </button>
    </form>
  );
}
