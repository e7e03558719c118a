"use client";
import { useState, useTransition } from "react";
import { retryNoticesAction } from "./actions";
import { buttonStyles } from "@/components/ui/button-styles";

export function RetryAllButton({ ids }: { ids: string[] }) {
  const [pending, start] = useTransition();
  const [message, setMessage] = useState<string>();
  return (
    <div className="flex items-center gap-3">
      <button
        type="button"
        className={buttonStyles.secondary}
        disabled={pending || !ids.length}
        onClick={() =>
          start(async () => {
            const r = await retryNoticesAction({ ids });
            setMessage(r.ok ? `${r.data.count} notice(s) queued to send now.` : r.error);
          })
        }
      >
        {pending ? "Queuing…" : "Try sending all now"}
      </button>
      {message && <span role="status" className="text-sm text-muted">{message}</span>}
    </div>
  );
}
