import { STAGE_LABELS, type Stage } from "@/lib/stages/stages";
import { StageGlyph } from "./stage-glyph";
import { STAGE_TONE } from "./stage-tone";

export function StageBadge({ stage }: { stage: Stage }) {
  const tone = STAGE_TONE[stage];
  return (
    <span className={`inline-flex items-center gap-1.5 rounded-full px-2.5 py-0.5 text-xs font-semibold ${tone.soft} ${tone.text}`}>
      <StageGlyph stage={stage} className="h-3.5 w-3.5" />
      {STAGE_LABELS[stage]}
    </span>
  );
}
