"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { sendJson } from "@/lib/http/send-json";
import { buttonStyles, inputStyles } from "@/components/ui/button-styles";
import { EquipmentForm, type EditablePiece } from "./equipment-form";

/** Recording a service by hand, changing the piece, or retiring it with a reason. */
export function PieceActions({ projectId, piece, today, kindIntervals }: { projectId: string; piece: EditablePiece; today: string; kindIntervals: Record<string, number | null> }) {
  const router = useRouter();
  const [mode, setMode] = useState<"idle" | "service" | "edit" | "retire">("idle");
  const [servicedOn, setServicedOn] = useState(today);
  const [note, setNote] = useState("");
  const [reason, setReason] = useState("");
  // One key per service being entered, so a save retried on a poor connection is recorded once.
  const [clientKey, setClientKey] = useState(() => crypto.randomUUID());
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const close = () => {
    setMode("idle");
    setError(null);
  };
  const send = async (url: string, body: unknown, field: string) => {
    setBusy(true);
    setError(null);
    const r = await sendJson(url, "POST", body);
    setBusy(false);
    if (!r.ok) return setError(r.fields?.[field] ?? r.error);
    setClientKey(crypto.randomUUID());
    setNote("");
    close();
    router.refresh();
  };
  const base = `/api/projects/${projectId}/equipment/${piece.id}`;
  return (
    <div className="flex flex-col gap-2">
      {mode === "idle" && (
        <div className="flex flex-wrap gap-3">
          <button type="button" className={buttonStyles.quiet} onClick={() => setMode("service")}>
            Record a service
          </button>
          <button type="button" className={buttonStyles.quiet} onClick={() => setMode("edit")}>
            Change
          </button>
          <button type="button" className={buttonStyles.quiet} onClick={() => setMode("retire")}>
            Retire…
          </button>
        </div>
      )}
      {mode === "service" && (
        <div className="grid gap-2 sm:grid-cols-[auto_1fr]">
          <label htmlFor={`svc-on-${piece.id}`} className="text-xs font-medium sm:self-center">
            Serviced on
          </label>
          <input id={`svc-on-${piece.id}`} type="date" max={today} className={inputStyles} value={servicedOn} onChange={(e) => setServicedOn(e.target.value)} />
          <label htmlFor={`svc-note-${piece.id}`} className="text-xs font-medium sm:self-center">
            What was done
          </label>
          <input id={`svc-note-${piece.id}`} className={inputStyles} value={note} onChange={(e) => setNote(e.target.value)} placeholder="Cleaned the media baskets, new O-ring" />
          {error && (
            <p role="alert" className="text-xs text-danger sm:col-span-2">
              {error}
            </p>
          )}
          <div className="flex gap-2 sm:col-span-2">
            <button type="button" className={buttonStyles.primary} disabled={busy} onClick={() => send(`${base}/services`, { servicedOn, note, clientKey }, "servicedOn")}>
              {busy ? "Saving…" : "Save the service"}
            </button>
            <button type="button" className={buttonStyles.secondary} onClick={close}>
              Not now
            </button>
          </div>
        </div>
      )}
      {mode === "edit" && (
        <>
          <EquipmentForm projectId={projectId} kindIntervals={kindIntervals} editing={piece} onDone={close} />
          <button type="button" className={`${buttonStyles.secondary} w-fit`} onClick={close}>
            Keep it as it was
          </button>
        </>
      )}
      {mode === "retire" && (
        <div className="flex flex-col gap-1">
          <label htmlFor={`retire-${piece.id}`} className="text-xs font-medium">
            Why is it retired? (it stays on the record)
          </label>
          <input id={`retire-${piece.id}`} className={inputStyles} value={reason} onChange={(e) => setReason(e.target.value)} aria-invalid={!!error} />
          {error && (
            <p role="alert" className="text-xs text-danger">
              {error}
            </p>
          )}
          <div className="flex gap-2">
            <button type="button" className={buttonStyles.danger} disabled={busy} onClick={() => send(`${base}/retire`, { reason }, "reason")}>
              {busy ? "Retiring…" : "Retire it"}
            </button>
            <button type="button" className={buttonStyles.secondary} onClick={close}>
              Keep it
            </button>
          </div>
        </div>
      )}
    </div>
  );
}
