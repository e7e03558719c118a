import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { getSessionUser } from "@/server/session";
import { ROLE_HOME } from "@/lib/auth/roles";
import { SignInForm } from "./sign-in-form";
import { WRONG_CREDENTIALS, messageForCode } from "./sign-in-messages";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ error?: string; callbackUrl?: string }> }) {
  const user = await getSessionUser();
  if (user) redirect(ROLE_HOME[user.role]);
  const { error } = await searchParams;
  return (
    <>
      <h1 className="mb-1 text-xl font-bold">Sign in</h1>
      <p className="mb-5 text-sm text-muted">Use the e-mail address your installer has for you.</p>
      <SignInForm initialError={error ? (messageForCode(error) ?? WRONG_CREDENTIALS) : undefined} />
    </>
  );
}
