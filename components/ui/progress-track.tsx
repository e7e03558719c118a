import { STAGES, STAGE_LABELS, type Stage } from "@/lib/stages/stages";
import { StageGlyph } from "./stage-glyph";
import { STAGE_TONE } from "./stage-tone";

/** All seven stages in a row: the ones passed, the current one, and what is still to come. */
export function ProgressTrack({ stage, compact = false }: { stage: Stage; compact?: boolean }) {
  const current = STAGES.indexOf(stage);
  return (
    <ol className="flex w-full items-stretch gap-1" aria-label={`Progress: ${STAGE_LABELS[stage]}, stage ${current + 1} of ${STAGES.length}`}>
      {STAGES.map((s, i) => {
        const tone = STAGE_TONE[s];
        const state = i < current ? "done" : i === current ? "current" : "todo";
        return (
          <li key={s} className="flex min-w-0 flex-1 flex-col gap-1" aria-current={state === "current" ? "step" : undefined}>
            <span className={`h-1.5 rounded-full ${state === "todo" ? "bg-line" : tone.bg} ${state === "current" ? "ring-2 ring-offset-1 ring-current " + tone.text : ""}`} />
            {!compact && (
              <span className={`flex items-center gap-1 truncate text-[11px] ${state === "todo" ? "text-muted" : tone.text} ${state === "current" ? "font-semibold" : ""}`}>
                <StageGlyph stage={s} className="h-3 w-3 shrink-0" />
                <span className="truncate">{STAGE_LABELS[s]}</span>
              </span>
            )}
          </li>
        );
      })}
    </ol>
  );
}
