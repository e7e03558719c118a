import { NextResponse } from "next/server";
import { projectRoute } from "@/server/route";
import { addPlanBatch } from "@/db/queries/stocking-plan";
import { planBatchSchema } from "../plan.schema";

/** A batch added at the end of the plan; the lead only. */
export const POST = projectRoute({ action: "edit_stocking_plan", schema: planBatchSchema }, async ({ input, project, user }) => {
  const batch = await addPlanBatch({ projectId: project.id, userId: user.id, items: input.items, note: input.note });
  return NextResponse.json({ batch }, { status: 201 });
});
