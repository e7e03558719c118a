"use client";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { signIn } from "next-auth/react";
import { signInSchema, type SignInInput } from "./sign-in.schema";
import { WRONG_CREDENTIALS, messageForCode } from "./sign-in-messages";
import { Field } from "@/components/ui/field";
import { buttonStyles, inputStyles } from "@/components/ui/button-styles";

export function SignInForm({ initialError }: { initialError?: string }) {
  const [error, setError] = useState(initialError);
  const { register, handleSubmit, formState } = useForm<SignInInput>({ resolver: zodResolver(signInSchema) });

  const onSubmit = handleSubmit(async (values) => {
    setError(undefined);
    const result = await signIn("credentials", { ...values, redirect: false });
    if (!result || result.error) {
      setError(
        result?.status && result.status >= 500
          ? "Signing in isn't working right now. Try again in a minute."
          : (messageForCode(result?.error) ?? WRONG_CREDENTIALS),
      );
      return;
    }
    // A full navigation so the server renders the right home for this role.
    window.location.assign("/");
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      {error && (
        <p role="alert" className="rounded-lg bg-danger-soft px-3 py-2 text-sm text-danger">
          {error}
        </p>
      )}
      <Field id="email" label="E-mail" error={formState.errors.email?.message}>
        <input id="email" type="email" autoComplete="email" className={inputStyles} aria-invalid={!!formState.errors.email} {...register("email")} />
      </Field>
      <Field id="password" label="Password" error={formState.errors.password?.message}>
        <input id="password" type="password" autoComplete="current-password" className={inputStyles} aria-invalid={!!formState.errors.password} {...register("password")} />
      </Field>
      <button type="submit" className={buttonStyles.primary} disabled={formState.isSubmitting}>
        {formState.isSubmitting ? "Signing in…" : "Sign in"}
      </button>
    </form>
  );
}
