import { NextResponse } from "next/server";
import { parseId, projectRoute } from "@/server/route";
import { replacePlanBatch } from "@/db/queries/stocking-plan";
import { planBatchSchema } from "../../plan.schema";

type Params = { id: string; batchId: string };

/** Changes the fish of a batch that is still only planned; the lead only. */
export const PUT = projectRoute<typeof planBatchSchema, undefined, Params>({ action: "edit_stocking_plan", schema: planBatchSchema }, async ({ input, project, params }) => {
  await replacePlanBatch({ projectId: project.id, batchId: parseId(params.batchId, "That batch"), items: input.items, note: input.note });
  return NextResponse.json({ ok: true });
});
