import { NextResponse } from "next/server";
import { parseId, parseJson, route } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { addBatchToDisplay } from "@/db/queries/quarantine";
import { addToDisplaySchema } from "@/app/(app)/projects/[id]/fish/quarantine.schema";

/**
 * Moves a batch from quarantine into the display: refused with reasons until its quarantine has
 * run (or the lead overrode it) and the water allows the next batch; nothing is saved on a refusal.
 */
export const POST = route<{ id: string; batchId: string }>(async (req, { params }) => {
  const { id, batchId } = await params;
  const input = await parseJson(req, addToDisplaySchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "record_stocking" });
  const result = await addBatchToDisplay({ projectId: project.id, batchId: parseId(batchId, "That batch"), user, addedAt: input.addedAt ?? new Date(), reTestOverride: input.reTestOverride });
  return NextResponse.json(result, { status: 201 });
});
