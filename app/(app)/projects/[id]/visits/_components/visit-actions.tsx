"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { sendJson } from "@/lib/http/send-json";
import { buttonStyles, inputStyles } from "@/components/ui/button-styles";
import { VisitForm, type EditableVisit } from "./visit-form";

/** The lead's corrections to a booked visit: change it, or cancel it with a reason (it stays on record). */
export function VisitActions({ projectId, visit }: { projectId: string; visit: EditableVisit }) {
  const router = useRouter();
  const [mode, setMode] = useState<"idle" | "edit" | "cancel">("idle");
  const [reason, setReason] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const cancel = async () => {
    setBusy(true);
    const r = await sendJson(`/api/projects/${projectId}/visits/${visit.id}/cancel`, "POST", { reason });
    setBusy(false);
    if (!r.ok) return setError(r.fields?.reason ?? r.error);
    setMode("idle");
    router.refresh();
  };
  return (
    <div className="mt-1 flex flex-col gap-2">
      {mode === "idle" && (
        <div className="flex gap-3">
          <button type="button" className={buttonStyles.quiet} onClick={() => setMode("edit")}>
            Change
          </button>
          <button type="button" className={buttonStyles.quiet} onClick={() => setMode("cancel")}>
            Cancel visit…
          </button>
        </div>
      )}
      {mode === "edit" && (
        <>
          <VisitForm projectId={projectId} editing={visit} onDone={() => setMode("idle")} />
          <button type="button" className={`${buttonStyles.secondary} w-fit`} onClick={() => setMode("idle")}>
            Keep it as it was
          </button>
        </>
      )}
      {mode === "cancel" && (
        <div className="flex flex-col gap-1">
          <label htmlFor={`cancel-${visit.id}`} className="text-xs font-medium">
            Why is this visit cancelled?
          </label>
          <input id={`cancel-${visit.id}`} className={inputStyles} value={reason} onChange={(e) => setReason(e.target.value)} aria-invalid={!!error} />
          {error && (
            <p role="alert" className="text-xs text-danger">
              {error}
            </p>
          )}
          <div className="flex gap-2">
            <button type="button" className={buttonStyles.danger} disabled={busy} onClick={cancel}>
              {busy ? "Cancelling…" : "Cancel the visit"}
            </button>
            <button type="button" className={buttonStyles.secondary} onClick={() => setMode("idle")}>
              Keep it
            </button>
          </div>
        </div>
      )}
    </div>
  );
}
