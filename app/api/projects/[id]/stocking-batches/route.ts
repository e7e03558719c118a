import { NextResponse } from "next/server";
import { projectRoute, requireAction } from "@/server/route";
import { badRequest, unprocessable } from "@/server/errors";
import { canOnProject } from "@/lib/auth/permissions";
import { addStockingBatch, listStockingBatches } from "@/db/queries/stocking";
import { stockingBatchSchema } from "./stocking-batch.schema";
import { READING_LIMITS } from "@/lib/cycling/readings";
import { directBatchQuarantineReason } from "@/lib/stocking/quarantine";
import { getQuarantineDays } from "@/db/queries/holding-tanks";

export const GET = projectRoute({ action: "view" }, async ({ project }) => NextResponse.json({ batches: await listStockingBatches(project.id) }));

/** Records a batch of fish; refused with plain reasons until the water and quarantine allow it, unless the lead overrides. */
export const POST = projectRoute({ action: "record_stocking", schema: stockingBatchSchema }, async ({ input, project, relation, user }) => {
  if (input.overrideReason) requireAction(relation, "override_gate", "Only the lead can add fish past the re-test rule.");
  const now = new Date();
  const addedAt = input.addedAt ?? now;
  if (addedAt.getTime() > now.getTime() + READING_LIMITS.futureToleranceMinutes * 60_000) {
    throw badRequest("Some fields need attention.", { addedAt: "That time is in the future; record fish once they are in." });
  }
  const by = { id: user.id, canOverride: canOnProject(relation, "override_gate") };
  const shortQuarantine = directBatchQuarantineReason({ days: input.quarantineDays, requiredDays: await getQuarantineDays(), override: null });
  if (shortQuarantine && !input.overrideReason) throw unprocessable(shortQuarantine, { reasons: [shortQuarantine], canOverride: by.canOverride });
  const result = await addStockingBatch({ projectId: project.id, user: by, values: { ...input, addedAt, quarantineWaived: !!shortQuarantine }, now });
  return NextResponse.json(result, { status: 201 });
});
