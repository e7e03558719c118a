import { NextResponse } from "next/server";
import { parseId, projectRoute } from "@/server/route";
import { addQuarantineNote } from "@/db/queries/quarantine";
import { quarantineNoteSchema } from "../quarantine.schema";

type Params = { id: string; batchId: string };

/** A daily observation or a treatment given; the lead or assigned crew. */
export const POST = projectRoute<typeof quarantineNoteSchema, undefined, Params>({ action: "record_quarantine", schema: quarantineNoteSchema }, async ({ input, project, user, params }) => {
  const note = await addQuarantineNote({ projectId: project.id, batchId: parseId(params.batchId, "That batch"), userId: user.id, kind: input.kind, at: input.at ?? new Date(), text: input.text });
  return NextResponse.json({ note }, { status: 201 });
});
