import { NextResponse } from "next/server";
import { parseJson, route } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { addPlanBatch } from "@/db/queries/stocking-plan";
import { planBatchSchema } from "@/app/(app)/projects/[id]/fish/plan.schema";

/** A batch added at the end of the plan; the lead only. */
export const POST = route<{ id: string }>(async (req, { params }) => {
  const { id } = await params;
  const input = await parseJson(req, planBatchSchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "edit_stocking_plan" });
  const batch = await addPlanBatch({ projectId: project.id, userId: user.id, items: input.items, note: input.note });
  return NextResponse.json({ batch }, { status: 201 });
});
