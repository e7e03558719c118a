import { NextResponse } from "next/server";
import { route } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { getCycleEvaluation } from "@/db/queries/cycle-state";
import { PHASE_LABELS } from "@/lib/cycling/evaluate-cycle";

/** The cycle gate as the board sees it: ready, phase, and the reasons still standing. */
export const GET = route<{ id: string }>(async (_req, ctx) => {
  const { id } = await ctx.params;
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "view" });
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
