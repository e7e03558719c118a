import { NextResponse } from "next/server";
import { parseJson, route } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { createNote, listNotes } from "@/db/queries/notes";
import { noteSchema } from "./note.schema";

type Params = { id: string };

/** Staff see every note; a client only the shared ones. */
export const GET = route<Params>(async (_req, { params }) => {
  const { id } = await params;
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "view" });
  return NextResponse.json({ notes: await listNotes(project.id, { sharedOnly: user.role === "client" }) });
});

export const POST = route<Params>(async (req, { params }) => {
  const { id } = await params;
  const input = await parseJson(req, noteSchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "write_note" });
  const note = await createNote({ project, author: user, body: input.body, shared: input.shared });
  return NextResponse.json({ id: note.id, shared: note.shared, body: note.body, email: note.email }, { status: 201 });
});
