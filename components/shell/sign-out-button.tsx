"use client";
import { useState } from "react";
import { forgetSavedPages } from "@/components/offline/saved-pages";

/**
 * Signs out through next-auth's own endpoint (CSRF token, then the sign-out POST), which ends every
 * session of the person on the server. Done by hand rather than with next-auth/react's signOut so
 * that every signed-in page doesn't ship that client library for one button.
 */
async function signOut(callbackUrl: string) {
  const csrf = await fetch("/api/auth/csrf", { cache: "no-store" });
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const res = await fetch("/api/auth/signout", {
    method: "POST",
    headers: { "content-type": "application/x-www-form-urlencoded" },
    body: new URLSearchParams({ csrfToken, callbackUrl, json: "true" }),
  });
  const data = (await res.json().catch(() => ({}))) as { url?: string };
  // next-auth answers with an absolute address; only its path is followed.
  const next = data.url ? new URL(data.url, window.location.href) : null;
  window.location.href = next && next.origin === window.location.origin ? `${next.pathname}${next.search}` : callbackUrl;
}

export function SignOutButton() {
  const [busy, setBusy] = useState(false);
  return (
    <button
      type="button"
      disabled={busy}
      onClick={() => {
        setBusy(true);
        // Pages kept for working without a signal are this person's: they go before the session does.
        forgetSavedPages()
          .then(() => signOut("/sign-in"))
          .catch(() => {
            setBusy(false);
            window.location.href = "/sign-in";
          });
      }}
      className="whitespace-nowrap text-sm font-medium text-muted hover:text-ink"
    >
      Sign out
    </button>
  );
}
