"use client";
import { useEffect, useId, useRef } from "react";
import { STAGE_LABELS, type Stage } from "@/lib/stages/stages";
import { buttonStyles } from "@/components/ui/button-styles";

/** Asks before a card jumps more than one stage: a slip of the hand shouldn't reach the client. */
export function SkipDialog({ title, from, to, skipped, onConfirm, onCancel }: { title: string; from: Stage; to: Stage; skipped: Stage[]; onConfirm: () => void; onCancel: () => void }) {
  const ref = useRef<HTMLDialogElement>(null);
  const id = useId();
  useEffect(() => {
    const d = ref.current;
    if (d && !d.open) d.showModal();
  }, []);
  const names = skipped.map((s) => STAGE_LABELS[s]);
  const list = names.length > 1 ? `${names.slice(0, -1).join(", ")} and ${names.at(-1)}` : names[0];
  return (
    <dialog
      ref={ref}
      aria-labelledby={`${id}-title`}
      aria-describedby={`${id}-body`}
      onCancel={(e) => {
        e.preventDefault();
        onCancel();
      }}
      className="m-auto w-[min(30rem,92vw)] rounded-2xl border border-line bg-card p-5 text-ink shadow-xl backdrop:bg-ink/40"
    >
      <h2 id={`${id}-title`} className="text-lg font-semibold">
        Skip {names.length === 1 ? "a stage" : `${names.length} stages`}?
      </h2>
      <p id={`${id}-body`} className="mt-2 text-sm">
        {title} would go from {STAGE_LABELS[from]} straight to {STAGE_LABELS[to]}, past {list}. The client is told about the move.
      </p>
      <div className="mt-4 flex flex-wrap justify-end gap-2">
        {/* eslint-disable-next-line jsx-a11y/no-autofocus -- a confirmation opens on its safe choice (WAI-ARIA APG alert dialog pattern) */}
        <button type="button" className={buttonStyles.secondary} onClick={onCancel} autoFocus>
          Keep it in {STAGE_LABELS[from]}
        </button>
        <button type="button" className={buttonStyles.primary} onClick={onConfirm}>
          Move to {STAGE_LABELS[to]}
        </button>
      </div>
    </dialog>
  );
}
