"use client";
import { signOut } from "next-auth/react";
import { forgetSavedPages } from "@/components/offline/saved-pages";

export function SignOutButton() {
  return (
    <button type="button" onClick={() => void forgetSavedPages().then(() => signOut({ callbackUrl: "/sign-in" }))} className="whitespace-nowrap text-sm font-medium text-muted hover:text-ink">
      Sign out
    </button>
  );
}
