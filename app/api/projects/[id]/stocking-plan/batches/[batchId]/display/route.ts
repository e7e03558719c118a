import { NextResponse } from "next/server";
import { parseId, projectRoute, requireAction } from "@/server/route";
import { canOnProject } from "@/lib/auth/permissions";
import { addBatchToDisplay } from "@/db/queries/quarantine";
import { addToDisplaySchema } from "../quarantine.schema";

type Params = { id: string; batchId: string };

/**
 * Moves a batch from quarantine into the display: refused with reasons until its quarantine has
 * run (or the lead overrode it) and the water allows the next batch; nothing is saved on a refusal.
 */
export const POST = projectRoute<typeof addToDisplaySchema, undefined, Params>({ action: "record_stocking", schema: addToDisplaySchema }, async ({ input, project, relation, user, params }) => {
  if (input.reTestOverride) requireAction(relation, "override_gate", "Only the lead can add fish past the re-test rule.");
  const by = { id: user.id, canOverride: canOnProject(relation, "override_gate") };
  const result = await addBatchToDisplay({ projectId: project.id, batchId: parseId(params.batchId, "That batch"), user: by, addedAt: input.addedAt ?? new Date(), reTestOverride: input.reTestOverride });
  return NextResponse.json(result, { status: 201 });
});
