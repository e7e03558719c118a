"use client";
import { useState, useTransition } from "react";
import { useRouter } from "next/navigation";
import { sendJson } from "@/lib/http/send-json";
import { buttonStyles } from "@/components/ui/button-styles";

/** Takes back the viewer's own water test inside the undo window; it stays on record as voided. */
export function TakeBackButton({ url, until }: { url: string; until: string }) {
  const router = useRouter();
  const [pending, start] = useTransition();
  const [error, setError] = useState<string>();
  return (
    <span className="flex flex-col items-start gap-1">
      <button
        type="button"
        className={buttonStyles.quiet}
        disabled={pending}
        onClick={() =>
          start(async () => {
            const r = await sendJson(url, "POST", {});
            if (!r.ok) setError(r.error);
            else router.refresh();
          })
        }
      >
        Take back (until {until})
      </button>
      {error && (
        <span role="alert" className="text-xs text-danger">
          {error}
        </span>
      )}
    </span>
  );
}
