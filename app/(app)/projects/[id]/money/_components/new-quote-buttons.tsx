"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { sendJson } from "@/lib/http/send-json";
import { buttonStyles } from "@/components/ui/button-styles";

/** Starts the next quote version as a draft, from the design and price list or from the current version. */
export function NewQuoteButtons({ projectId, hasCurrent }: { projectId: string; hasCurrent: boolean }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const start = async (from: "design" | "current") => {
    setBusy(true);
    setError(null);
    const res = await sendJson(`/api/projects/${projectId}/quotes`, "POST", { from });
    setBusy(false);
    if (!res.ok) setError(res.error);
    else router.refresh();
  };
  return (
    <div className="flex flex-wrap items-center gap-2">
      <button type="button" className={buttonStyles.primary} disabled={busy} onClick={() => start("design")}>
        Draft a quote from the design
      </button>
      {hasCurrent && (
        <button type="button" className={buttonStyles.secondary} disabled={busy} onClick={() => start("current")}>
          New version from the current quote
        </button>
      )}
      {error && (
        <p role="status" className="text-sm text-danger">
          {error}
        </p>
      )}
    </div>
  );
}
