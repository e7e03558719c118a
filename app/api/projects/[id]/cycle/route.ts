import { NextResponse } from "next/server";
import { projectRoute } from "@/server/route";
import { getCycleEvaluation } from "@/db/queries/cycle-state";
import { PHASE_LABELS } from "@/lib/cycling/evaluate-cycle";

/** The cycle gate as the board sees it: ready, phase, and the reasons still standing. */
export const GET = projectRoute({ action: "view" }, async ({ project }) => {
  const evaluation = await getCycleEvaluation(project.id, new Date());
  return NextResponse.json({
    ready: evaluation.ready,
    phase: evaluation.phase,
    phaseLabel: PHASE_LABELS[evaluation.phase],
    reasons: evaluation.reasons,
    daysSinceStart: evaluation.daysSinceStart,
    rules: evaluation.rules,
    cycleReadyNotifiedAt: project.cycleReadyNotifiedAt,
  });
});
