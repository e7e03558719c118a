import { NextResponse } from "next/server";
import { parseId, parseJson, route } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { addQuarantineNote } from "@/db/queries/quarantine";
import { quarantineNoteSchema } from "@/app/(app)/projects/[id]/fish/quarantine.schema";

/** A daily observation or a treatment given; the lead or assigned crew. */
export const POST = route<{ id: string; batchId: string }>(async (req, { params }) => {
  const { id, batchId } = await params;
  const input = await parseJson(req, quarantineNoteSchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "record_quarantine" });
  const note = await addQuarantineNote({ projectId: project.id, batchId: parseId(batchId, "That batch"), userId: user.id, kind: input.kind, at: input.at ?? new Date(), text: input.text });
  return NextResponse.json({ note }, { status: 201 });
});
