"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { sendJson } from "@/lib/http/send-json";
import { restartCycleSchema } from "@/app/api/projects/[id]/cycle/restart/restart.schema";
import { buttonStyles, inputStyles } from "@/components/ui/button-styles";

/**
 * The lead's deliberate restart of the cycle (after a crash in the tank, say). A card moved back
 * into cycling keeps its start; only this starts the count again, with a reason on the timeline.
 */
export function RestartCycleButton({ projectId }: { projectId: string }) {
  const router = useRouter();
  const [open, setOpen] = useState(false);
  const [reason, setReason] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  if (!open) {
    return (
      <button type="button" className={`${buttonStyles.secondary} self-start`} onClick={() => setOpen(true)}>
        Restart the cycle…
      </button>
    );
  }
  const submit = async () => {
    const parsed = restartCycleSchema.safeParse({ reason });
    if (!parsed.success) return setError(parsed.error.issues[0]?.message ?? "Say why.");
    setBusy(true);
    const result = await sendJson(`/api/projects/${projectId}/cycle/restart`, "POST", parsed.data);
    setBusy(false);
    if (!result.ok) return setError(result.fields?.reason ?? result.error);
    setOpen(false);
    setReason("");
    router.refresh();
  };
  return (
    <div className="flex max-w-xl flex-col gap-1">
      <label htmlFor="restart-reason" className="text-sm font-medium">
        Why start the cycle again?
      </label>
      <p className="text-xs text-muted">Readings before now stop counting towards the gate; the client sees the reason on the timeline.</p>
      <input id="restart-reason" className={inputStyles} value={reason} onChange={(e) => setReason(e.target.value)} aria-invalid={!!error} />
      {error && (
        <p role="alert" className="text-xs text-danger">
          {error}
        </p>
      )}
      <div className="flex gap-2">
        <button type="button" className={buttonStyles.danger} disabled={busy} onClick={submit}>
          {busy ? "Restarting…" : "Restart the cycle"}
        </button>
        <button type="button" className={buttonStyles.secondary} onClick={() => setOpen(false)}>
          Keep the cycle as it is
        </button>
      </div>
    </div>
  );
}
