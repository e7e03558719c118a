import { NextResponse } from "next/server";
import { projectRoute } from "@/server/route";
import { canOnProject } from "@/lib/auth/permissions";
import { createNote, listNotes } from "@/db/queries/notes";
import { noteSchema } from "./note.schema";

/** Staff see every note; a client only the shared ones. */
export const GET = projectRoute({ action: "view" }, async ({ project, relation }) => {
  return NextResponse.json({ notes: await listNotes(project.id, { sharedOnly: !canOnProject(relation, "view_internal") }) });
});

export const POST = projectRoute({ action: "write_note", schema: noteSchema }, async ({ input, project, user }) => {
  const note = await createNote({ project, author: user, body: input.body, shared: input.shared });
  return NextResponse.json({ id: note.id, shared: note.shared, body: note.body }, { status: 201 });
});
