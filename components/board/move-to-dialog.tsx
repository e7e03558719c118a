"use client";
import { useEffect, useId, useRef } from "react";
import { STAGES, STAGE_LABELS, type Stage } from "@/lib/stages/stages";
import { TankMark } from "@/components/ui/tank-mark";
import { STAGE_TONE } from "@/components/ui/stage-tone";
import { buttonStyles } from "@/components/ui/button-styles";

/** "Move to…": every stage as a button, for a card moved without dragging (a phone, a switch, a keyboard). */
export function MoveToDialog({ title, from, onChoose, onCancel }: { title: string; from: Stage; onChoose: (to: Stage) => void; onCancel: () => void }) {
  const ref = useRef<HTMLDialogElement>(null);
  const id = useId();
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
      className="m-auto w-[min(24rem,92vw)] rounded-2xl border border-line bg-card p-5 text-ink shadow-xl backdrop:bg-ink/40"
    >
      <h2 id={`${id}-title`} className="text-lg font-semibold">
        Move {title} to…
      </h2>
      <ul className="mt-3 flex flex-col gap-1">
        {STAGES.map((s) => (
          <li key={s}>
            <button
              type="button"
              disabled={s === from}
              onClick={() => onChoose(s)}
              className="flex w-full items-center gap-3 rounded-lg px-2 py-2 text-left text-sm hover:bg-paper disabled:cursor-default disabled:bg-paper"
            >
              <TankMark stage={s} className={`h-6 w-8 shrink-0 ${STAGE_TONE[s].fill}`} />
              <span className={`font-medium ${STAGE_TONE[s].text}`}>{STAGE_LABELS[s]}</span>
              {s === from && <span className="ml-auto text-xs text-muted">here now</span>}
            </button>
          </li>
        ))}
      </ul>
      <div className="mt-3 flex justify-end">
        <button type="button" className={buttonStyles.secondary} onClick={onCancel}>
          Keep it here
        </button>
      </div>
    </dialog>
  );
}
