import { NextResponse } from "next/server";
import { parseId, parseJson, route } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { replacePlanBatch } from "@/db/queries/stocking-plan";
import { planBatchSchema } from "@/app/(app)/projects/[id]/fish/plan.schema";

/** Changes the fish of a batch that is still only planned; the lead only. */
export const PUT = route<{ id: string; batchId: string }>(async (req, { params }) => {
  const { id, batchId } = await params;
  const input = await parseJson(req, planBatchSchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "edit_stocking_plan" });
  await replacePlanBatch({ projectId: project.id, batchId: parseId(batchId, "That batch"), items: input.items, note: input.note });
  return NextResponse.json({ ok: true });
});
