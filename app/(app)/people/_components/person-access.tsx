"use client";
import { useState, useTransition } from "react";
import { useRouter } from "next/navigation";
import { sendJson } from "@/lib/http/send-json";
import { ROLES, ROLE_LABELS, type Role } from "@/lib/auth/roles";

/** The lead's controls for one person: their role, and whether they can sign in at all. */
export function PersonAccess({ userId, name, role, deactivated }: { userId: string; name: string; role: Role; deactivated: boolean }) {
  const router = useRouter();
  const [pending, start] = useTransition();
  const [message, setMessage] = useState<string>();

  const change = (body: { role?: Role; active?: boolean }, done: string) =>
    start(async () => {
      const r = await sendJson(`/api/people/${userId}`, "PATCH", body);
      setMessage(r.ok ? done : r.error);
      router.refresh();
    });

  return (
    <span className="flex flex-wrap items-center gap-2">
      <label className="sr-only" htmlFor={`role-${userId}`}>
        Role for {name}
      </label>
      <select
        id={`role-${userId}`}
        value={role}
        disabled={pending}
        className="rounded-md border border-line bg-card px-2 py-1 text-sm"
        onChange={(e) => change({ role: e.target.value as Role }, `Now ${ROLE_LABELS[e.target.value as Role].toLowerCase()}.`)}
      >
        {ROLES.map((r) => (
          <option key={r} value={r}>
            {ROLE_LABELS[r]}
          </option>
        ))}
      </select>
      <button
        type="button"
        disabled={pending}
        className={`text-sm font-semibold hover:underline disabled:opacity-50 ${deactivated ? "text-accent" : "text-danger"}`}
        onClick={() =>
          deactivated
            ? change({ active: true }, `${name} can sign in again.`)
            : change({ active: false }, `${name} is signed out everywhere and can't sign in.`)
        }
      >
        {deactivated ? "Reactivate" : "Deactivate"}
      </button>
      {message && (
        <span role="status" className="text-xs text-muted">
          {message}
        </span>
      )}
    </span>
  );
}
