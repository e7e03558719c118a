import { NextResponse } from "next/server";
import { route, parseJson } from "@/server/route";
import { requireUser } from "@/server/session";
import { badRequest } from "@/server/errors";
import { requireProject } from "@/db/queries/project-access";
import { addStockingBatch, listStockingBatches } from "@/db/queries/stocking";
import { stockingBatchSchema } from "@/app/(app)/projects/[id]/water/stocking-batch.schema";
import { READING_LIMITS } from "@/lib/cycling/readings";

type Params = { id: string };

export const GET = route<Params>(async (_req, ctx) => {
  const { id } = await ctx.params;
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "view" });
  return NextResponse.json({ batches: await listStockingBatches(project.id) });
});

/** Records a batch of fish; refused with plain reasons until the water allows it, unless the lead overrides. */
export const POST = route<Params>(async (req, ctx) => {
  const { id } = await ctx.params;
  const input = await parseJson(req, stockingBatchSchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "record_stocking" });
  const now = new Date();
  const addedAt = input.addedAt ?? now;
  if (addedAt.getTime() > now.getTime() + READING_LIMITS.futureToleranceMinutes * 60_000) {
    throw badRequest("Some fields need attention.", { addedAt: "That time is in the future; record fish once they are in." });
  }
  const result = await addStockingBatch({ projectId: project.id, user, values: { ...input, addedAt }, now });
  return NextResponse.json(result, { status: 201 });
});
