"use client";
import { useDroppable } from "@dnd-kit/core";
import { STAGES, STAGE_LABELS, type Stage } from "@/lib/stages/stages";
import { TankMark } from "@/components/ui/tank-mark";
import { STAGE_TONE } from "@/components/ui/stage-tone";
import { installsWords } from "./count-words";

export const switchId = (stage: Stage) => `switch:${stage}`;

function SwitchButton({ stage, count, chosen, onChoose }: { stage: Stage; count: number; chosen: boolean; onChoose: (s: Stage) => void }) {
  // A card dragged onto a stage's tank here is dropped at the end of that stage.
  const { setNodeRef, isOver } = useDroppable({ id: switchId(stage), data: { stage } });
  const tone = STAGE_TONE[stage];
  return (
    <li className="min-w-0">
      <button
        ref={setNodeRef}
        type="button"
        aria-pressed={chosen}
        onClick={() => onChoose(stage)}
        data-testid={`switch-${stage}`}
        className={`flex w-full flex-col items-center gap-0.5 rounded-lg border px-0.5 py-1.5 ${chosen ? `border-accent ${tone.soft}` : "border-transparent"} ${isOver ? "ring-2 ring-accent" : ""}`}
      >
        <TankMark stage={stage} className={`h-5 w-7 ${tone.fill}`} />
        {/* The name is spoken from the content, so it always contains what is shown (the count). */}
        <span className="sr-only">
          {STAGE_LABELS[stage]}: {installsWords(count)}
        </span>
        <span className={`num text-xs font-semibold ${tone.text}`} aria-hidden="true">
          {count}
        </span>
      </button>
    </li>
  );
}

/**
 * On a phone the board shows one stage at a time: this row of the stages' tanks, each with its count,
 * chooses which. Each is also a drop target, so a card can be dragged to any stage from here.
 */
export function StageSwitcher({ counts, chosen, onChoose }: { counts: Record<Stage, number>; chosen: Stage; onChoose: (s: Stage) => void }) {
  return (
    <nav aria-label="Stages" className="md:hidden">
      <ol className="grid grid-cols-7 gap-0.5">
        {STAGES.map((s) => (
          <SwitchButton key={s} stage={s} count={counts[s]} chosen={s === chosen} onChoose={onChoose} />
        ))}
      </ol>
    </nav>
  );
}
