import { NextResponse } from "next/server";
import { parseId, projectRoute } from "@/server/route";
import { notFound } from "@/server/errors";
import { setNoteSharing } from "@/db/queries/notes";
import { noteSharingSchema } from "../note.schema";

/** Shares a note with the client, or makes it internal again. Notes are never deleted. */
export const PATCH = projectRoute<typeof noteSharingSchema, undefined, { id: string; noteId: string }>(
  { action: "write_note", schema: noteSharingSchema },
  async ({ input, project, user, params }) => {
    const note = await setNoteSharing({ project, noteId: parseId(params.noteId, "That note"), shared: input.shared, by: user });
    if (!note) throw notFound("That note");
    return NextResponse.json({ id: note.id, shared: note.shared });
  },
);
