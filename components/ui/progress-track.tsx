import { STAGES, STAGE_LABELS, nextStage, type Stage } from "@/lib/stages/stages";
import { TankMark } from "./tank-mark";
import { STAGE_TONE } from "./stage-tone";

/**
 * A project's stage track: the tank drawn at each of the seven stages, so the water rises from left
 * to right up to where the project stands; stages still to come are faint outlines. On a phone the
 * names give way to one line saying where it stands and what comes next.
 */
export function ProgressTrack({ stage, compact = false }: { stage: Stage; compact?: boolean }) {
  const current = STAGES.indexOf(stage);
  const next = nextStage(stage);
  return (
    <div className="flex flex-col gap-1" data-testid="stage-track">
      <ol className="grid grid-cols-7 items-end gap-1" aria-label={`Progress: ${STAGE_LABELS[stage]}, stage ${current + 1} of ${STAGES.length}`}>
        {STAGES.map((s, i) => {
          const tone = STAGE_TONE[s];
          const state = i < current ? "done" : i === current ? "current" : "todo";
          return (
            <li key={s} className="flex min-w-0 flex-col items-center gap-1 text-center" aria-current={state === "current" ? "step" : undefined}>
              <span className={`flex items-center justify-center rounded-lg px-1 pt-1 ${state === "current" ? `${tone.soft} ring-1 ring-current ${tone.text}` : ""}`}>
                <TankMark stage={s} dim={state === "todo"} className={`${state === "current" ? "h-8 w-11" : "h-6 w-8"} ${state === "todo" ? "text-muted" : tone.fill}`} />
              </span>
              <span
                className={`${compact ? "sr-only" : "sr-only sm:not-sr-only"} text-xs leading-tight break-words hyphens-auto ${state === "todo" ? "text-muted" : tone.text} ${state === "current" ? "font-semibold" : ""}`}
              >
                {STAGE_LABELS[s]}
                {state === "done" && <span className="sr-only"> (done)</span>}
                {state === "current" && <span className="sr-only"> (now)</span>}
              </span>
            </li>
          );
        })}
      </ol>
      <p className={`${compact ? "" : "sm:hidden"} text-sm`} aria-hidden="true">
        <span className={`font-semibold ${STAGE_TONE[stage].text}`}>{STAGE_LABELS[stage]}</span>
        <span className="text-muted">
          {" "}
          · stage {current + 1} of {STAGES.length}
          {next ? `, then ${STAGE_LABELS[next]}` : ""}
        </span>
      </p>
    </div>
  );
}
