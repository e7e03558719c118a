import "server-only";
import { and, asc, eq, inArray, isNull, like } from "drizzle-orm";
import { db } from "../index";
import type { Tx } from "../index";
import { notes, notices, users } from "../schema";
import type { ProjectRow } from "./project-access";
import { companyName, enqueueNotice, noticeSendAfter, pendingNotices, withdrawNotices } from "./outbox";
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

/** The e-mail a sharing queued: who it goes to and when it leaves (until then it can be taken back). */
export type SharedNoteEmail = { to: string; leavesAt: string } | null;

/** Adds a note; a shared one also queues an e-mail to the client, in the same transaction. */
export async function createNote(opts: { project: ProjectRow; author: { id: string; name: string }; body: string; shared: boolean }) {
  return db().transaction(async (tx) => {
    const [note] = await tx.insert(notes).values({ projectId: opts.project.id, authorId: opts.author.id, body: opts.body, shared: opts.shared }).returning();
    const email = note.shared ? await queueSharedNoteNotice(tx, opts.project, note.id, opts.author.name, note.body) : null;
    return { ...note, email };
  });
}

/**
 * Changes whether a note is shared with the client. Null when the note isn't on this project.
 * Sharing a note that was internal queues an e-mail to the client that waits out the notice delay;
 * making it internal again hides it and takes that e-mail back if it has not left yet.
 */
export async function setNoteSharing(opts: { project: ProjectRow; noteId: string; shared: boolean; by: { id: string; name: string } }) {
  return db().transaction(async (tx) => {
    const [before] = await tx
      .select()
      .from(notes)
      .where(and(eq(notes.id, opts.noteId), eq(notes.projectId, opts.project.id)))
      .for("update");
    if (!before) return null;
    const none = { email: null as SharedNoteEmail, takenBack: false, alreadySent: false };
    if (before.shared === opts.shared) return { ...before, ...none };
    const [after] = await tx.update(notes).set({ shared: opts.shared }).where(eq(notes.id, before.id)).returning();
    if (after.shared) {
      const [author] = await tx.select({ name: users.name }).from(users).where(eq(users.id, after.authorId));
      const email = await queueSharedNoteNotice(tx, opts.project, after.id, author?.name ?? opts.by.name, after.body);
      return { ...after, ...none, email };
    }
    const pending = await pendingNotices(tx, noteSource(after.id));
    const takenBack = (await withdrawNotices(tx, pending.map((n) => n.id))) > 0;
    // Shared before and nothing left to take back: the client was already told.
    return { ...after, ...none, takenBack, alreadySent: !takenBack };
  });
}

const noteSource = (noteId: string) => `note:${noteId}`;

async function queueSharedNoteNotice(tx: Tx, project: ProjectRow, noteId: string, authorName: string, body: string): Promise<SharedNoteEmail> {
  const [client] = await tx.select({ id: users.id, name: users.name, email: users.email }).from(users).where(eq(users.id, project.clientId));
  if (!client) return null;
  const email = sharedNoteEmail({
    companyName: await companyName(tx),
    recipientName: client.name,
    projectTitle: project.title,
    authorName,
    body,
    url: `${env().APP_URL}/projects/${project.id}/talk`,
  });
  const sendAfter = await noticeSendAfter(tx);
  const id = await enqueueNotice(tx, { kind: "shared_note", projectId: project.id, recipientId: client.id, toEmail: client.email, email, sendAfter, source: noteSource(noteId) });
  return id ? { to: client.name, leavesAt: sendAfter.toISOString() } : null;
}

/** Who sees a shared note: the project's client, by name (the team sees every note already). */
export async function noteAudience(project: ProjectRow): Promise<{ name: string; email: string }[]> {
  const rows = await db().select({ name: users.name, email: users.email }).from(users).where(eq(users.id, project.clientId));
  return rows;
}

/** Shared notes whose e-mail has not left yet, with when it leaves: these can still be taken back. */
export async function pendingNoteEmails(projectId: string): Promise<Map<string, Date>> {
  const rows = await db()
    .select({ source: notices.source, sendAfter: notices.sendAfter })
    .from(notices)
    .where(and(eq(notices.projectId, projectId), like(notices.source, "note:%"), inArray(notices.status, ["waiting", "failed"]), isNull(notices.sentAt)));
  return new Map(rows.map((r) => [r.source!.slice("note:".length), r.sendAfter]));
}
