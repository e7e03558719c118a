"use client";
import { useEffect, useId, useRef, useState } from "react";
import { buttonStyles, inputStyles } from "@/components/ui/button-styles";

export type ReasonRequest = { kind: "back" | "override"; title: string; toLabel: string; reasons: string[] };

/** Asks why a card goes back a stage, or (for the lead) why a closed gate may be passed. */
export function MoveReasonDialog({ request, onSubmit, onCancel }: { request: ReasonRequest; onSubmit: (reason: string) => void; onCancel: () => void }) {
  const ref = useRef<HTMLDialogElement>(null);
  const id = useId();
  const [reason, setReason] = useState("");
  const [error, setError] = useState<string | null>(null);
  const min = request.kind === "override" ? 5 : 2;
  useEffect(() => {
    const d = ref.current;
    if (d && !d.open) d.showModal();
  }, []);
  return (
    <dialog
      ref={ref}
      aria-labelledby={`${id}-title`}
      onCancel={(e) => {
        e.preventDefault();
        onCancel();
      }}
      className="m-auto w-[min(32rem,92vw)] rounded-2xl border border-line bg-card p-5 text-ink shadow-xl backdrop:bg-ink/40"
    >
      <form
        method="dialog"
        onSubmit={(e) => {
          e.preventDefault();
          if (reason.trim().length < min) {
            setError(request.kind === "override" ? "Say in a few words why the gate may be passed." : "Say why the card is going back.");
            return;
          }
          onSubmit(reason.trim());
        }}
        className="flex flex-col gap-3"
      >
        <h2 id={`${id}-title`} className="text-lg font-semibold">
          {request.kind === "back" ? `Move ${request.title} back to ${request.toLabel}?` : `Pass the gate into ${request.toLabel}?`}
        </h2>
        {request.kind === "override" && (
          <div className="rounded-lg bg-caution-soft p-3 text-sm text-caution">
            <p className="font-semibold">The gate says:</p>
            <ul className="ml-4 list-disc">
              {request.reasons.map((r) => (
                <li key={r}>{r}</li>
              ))}
            </ul>
            <p className="mt-1">Your reason is kept on the project's timeline, which the client can see.</p>
          </div>
        )}
        <label htmlFor={`${id}-reason`} className="text-sm font-medium">
          Reason
        </label>
        <textarea
          id={`${id}-reason`}
          rows={3}
          className={inputStyles}
          value={reason}
          aria-invalid={!!error}
          aria-describedby={error ? `${id}-error` : undefined}
          onChange={(e) => setReason(e.target.value)}
          maxLength={500}
          // eslint-disable-next-line jsx-a11y/no-autofocus -- a dialog opened on purpose starts on its only field (WAI-ARIA APG dialog pattern)
          autoFocus
        />
        {error && (
          <p id={`${id}-error`} className="text-xs font-medium text-danger">
            {error}
          </p>
        )}
        <div className="flex justify-end gap-2">
          <button type="button" className={buttonStyles.secondary} onClick={onCancel}>
            Keep it where it was
          </button>
          <button type="submit" className={request.kind === "override" ? buttonStyles.danger : buttonStyles.primary}>
            {request.kind === "back" ? "Move back" : "Pass the gate and move"}
          </button>
        </div>
      </form>
    </dialog>
  );
}
