"use client";
import { signOut } from "next-auth/react";

export function SignOutButton() {
  return (
    <button type="button" onClick={() => signOut({ callbackUrl: "/sign-in" })} className="whitespace-nowrap text-sm font-medium text-muted hover:text-ink">
      Sign out
    </button>
  );
}
