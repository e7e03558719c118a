"use client";
import { useState, useTransition } from "react";
import { useRouter } from "next/navigation";
import { sendJson } from "@/lib/http/send-json";

export function ResendButton({ userId }: { userId: string }) {
  const router = useRouter();
  const [pending, start] = useTransition();
  const [message, setMessage] = useState<string>();
  return (
    <span className="inline-flex items-center gap-2">
      <button
        type="button"
        disabled={pending}
        className="text-sm font-semibold text-accent hover:underline disabled:opacity-50"
        onClick={() =>
          start(async () => {
            const r = await sendJson(`/api/people/${userId}/invitation`, "POST");
            setMessage(r.ok ? "New link sent." : r.error);
            router.refresh();
          })
        }
      >
        {pending ? "Sending…" : "Send a new link"}
      </button>
      {message && <span className="text-xs text-muted">{message}</span>}
    </span>
  );
}
