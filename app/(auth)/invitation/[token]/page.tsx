import type { Metadata } from "next";
import Link from "next/link";
import { checkInvitation } from "@/db/queries/users";
import { buttonStyles } from "@/components/ui/button-styles";
import { SetPasswordForm } from "./set-password-form";

export const metadata: Metadata = { title: "Set your password" };

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const state = token.length >= 20 && token.length <= 100 ? await checkInvitation(token) : null;
  if (!state || !state.ok) {
    return (
      <div className="flex flex-col gap-4">
        <h1 className="text-xl font-bold">This link can't be used</h1>
        <p className="text-sm text-muted">{state?.message ?? "This invitation link isn't valid. Ask your project lead for a new one."}</p>
        <Link href="/sign-in" className={buttonStyles.secondary}>
          Go to sign in
        </Link>
      </div>
    );
  }
  return (
    <>
      <h1 className="mb-1 text-xl font-bold">Welcome, {state.name}</h1>
      <p className="mb-5 text-sm text-muted">Choose a password for {state.email}. You'll use it to sign in from now on.</p>
      <SetPasswordForm token={token} email={state.email} />
    </>
  );
}
