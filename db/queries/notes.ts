import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { db } from "../index";
import type { Tx } from "../index";
import { notes, users } from "../schema";
import type { ProjectRow } from "./project-access";
import { companyName, enqueueNotice } from "./outbox";
import { sharedNoteEmail } from "../../lib/mail/shared-note-email";
import { env } from "../../env";

export type NoteView = { id: string; body: string; shared: boolean; createdAt: Date; authorName: string; authorRole: string };

/** A project's notes, oldest first. Clients get shared notes only: the filter is in the `where`. */
export async function listNotes(projectId: string, opts: { sharedOnly: boolean }): Promise<NoteView[]> {
  return db()
    .select({ id: notes.id, body: notes.body, shared: notes.shared, createdAt: notes.createdAt, authorName: users.name, authorRole: users.role })
    .from(notes)
    .innerJoin(users, eq(users.id, notes.authorId))
    .where(opts.sharedOnly ? and(eq(notes.projectId, projectId), eq(notes.shared, true)) : eq(notes.projectId, projectId))
    .orderBy(asc(notes.createdAt));
}

/** Adds a note; a shared one also queues an e-mail to the client, in the same transaction. */
export async function createNote(opts: { project: ProjectRow; author: { id: string; name: string }; body: string; shared: boolean }) {
  return db().transaction(async (tx) => {
    const [note] = await tx.insert(notes).values({ projectId: opts.project.id, authorId: opts.author.id, body: opts.body, shared: opts.shared }).returning();
    if (note.shared) await queueSharedNoteNotice(tx, opts.project, opts.author.name, note.body);
    return note;
  });
}

/**
 * Changes whether a note is shared with the client. Null when the note isn't on this project.
 * Sharing a note that was internal tells the client; un-sharing only hides it again.
 */
export async function setNoteSharing(opts: { project: ProjectRow; noteId: string; shared: boolean; by: { id: string; name: string } }) {
  return db().transaction(async (tx) => {
    const [before] = await tx
      .select()
      .from(notes)
      .where(and(eq(notes.id, opts.noteId), eq(notes.projectId, opts.project.id)))
      .for("update");
    if (!before) return null;
    if (before.shared === opts.shared) return before;
    const [after] = await tx.update(notes).set({ shared: opts.shared }).where(eq(notes.id, before.id)).returning();
    if (after.shared) {
      const [author] = await tx.select({ name: users.name }).from(users).where(eq(users.id, after.authorId));
      await queueSharedNoteNotice(tx, opts.project, author?.name ?? opts.by.name, after.body);
    }
    return after;
  });
}

async function queueSharedNoteNotice(tx: Tx, project: ProjectRow, authorName: string, body: string) {
  const [client] = await tx.select({ id: users.id, name: users.name, email: users.email }).from(users).where(eq(users.id, project.clientId));
  if (!client) return;
  const email = sharedNoteEmail({
    companyName: await companyName(tx),
    recipientName: client.name,
    projectTitle: project.title,
    authorName,
    body,
    url: `${env().APP_URL}/projects/${project.id}/talk`,
  });
  await enqueueNotice(tx, { kind: "shared_note", projectId: project.id, recipientId: client.id, toEmail: client.email, email });
}
