import { NextResponse } from "next/server";
import { parseId, parseJson, route } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { startQuarantine } from "@/db/queries/quarantine";
import { startQuarantineSchema } from "@/app/(app)/projects/[id]/fish/quarantine.schema";

/** Puts a planned batch into a holding tank; the lead or assigned crew. */
export const POST = route<{ id: string; batchId: string }>(async (req, { params }) => {
  const { id, batchId } = await params;
  const input = await parseJson(req, startQuarantineSchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "record_quarantine" });
  const batch = await startQuarantine({ projectId: project.id, batchId: parseId(batchId, "That batch"), holdingTankId: input.holdingTankId, startedAt: input.startedAt ?? new Date() });
  return NextResponse.json({ batch }, { status: 201 });
});
