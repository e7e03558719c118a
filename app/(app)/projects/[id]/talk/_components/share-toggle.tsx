"use client";
import { useState, useTransition } from "react";
import { useRouter } from "next/navigation";
import { sendJson } from "@/lib/http/send-json";
import { buttonStyles } from "@/components/ui/button-styles";

export function ShareToggle({ projectId, noteId, shared }: { projectId: string; noteId: string; shared: boolean }) {
  const router = useRouter();
  const [pending, start] = useTransition();
  const [error, setError] = useState<string>();
  return (
    <span className="flex items-center gap-2">
      <button
        type="button"
        className={buttonStyles.quiet}
        disabled={pending}
        onClick={() =>
          start(async () => {
            const r = await sendJson(`/api/projects/${projectId}/notes/${noteId}`, "PATCH", { shared: !shared });
            if (!r.ok) setError(r.error);
            else router.refresh();
          })
        }
      >
        {shared ? "Make internal" : "Share with client"}
      </button>
      {error && <span role="alert" className="text-xs text-danger">{error}</span>}
    </span>
  );
}
