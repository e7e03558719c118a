import { NextResponse } from "next/server";
import { parseId, parseJson, route } from "@/server/route";
import { requireUser } from "@/server/session";
import { notFound } from "@/server/errors";
import { requireProject } from "@/db/queries/project-access";
import { setNoteSharing } from "@/db/queries/notes";
import { noteSharingSchema } from "../note.schema";

type Params = { id: string; noteId: string };

/** Shares a note with the client, or makes it internal again. Notes are never deleted. */
export const PATCH = route<Params>(async (req, { params }) => {
  const { id, noteId } = await params;
  const input = await parseJson(req, noteSharingSchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "write_note" });
  const note = await setNoteSharing({ project, noteId: parseId(noteId, "That note"), shared: input.shared, by: user });
  if (!note) throw notFound("That note");
  return NextResponse.json({ id: note.id, shared: note.shared, email: note.email, takenBack: note.takenBack, alreadySent: note.alreadySent });
});
