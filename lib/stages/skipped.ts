import { STAGES, stageIndex, type Stage } from "./stages";

/** The stages a forward move jumps over (none for a move of one stage, a move back or a reorder). */
export function skippedStages(from: Stage, to: Stage): Stage[] {
  const a = stageIndex(from);
  const b = stageIndex(to);
  return b - a > 1 ? STAGES.slice(a + 1, b) : [];
}
