import "server-only";
import { and, asc, eq, isNotNull, isNull } from "drizzle-orm";
import { db } from "../index";
import { attachments, users } from "../schema";
import type { Stage } from "../../lib/stages/stages";

export type AttachmentRow = typeof attachments.$inferSelect;

export async function createPendingAttachment(input: {
  projectId: string;
  stage: Stage;
  key: string;
  contentType: string;
  sizeBytes: number;
  fileName: string;
  caption: string | null;
  isProblem: boolean;
  uploadedBy: string;
  status?: "pending" | "ready";
  thumbKey?: string | null;
  clientKey?: string | null;
  takenAt?: Date | null;
}): Promise<AttachmentRow | null> {
  // A second upload under the same device key inserts nothing; the caller then returns the first.
  const [row] = await db()
    .insert(attachments)
    .values({ ...input, status: input.status ?? "pending", thumbKey: input.thumbKey ?? null, clientKey: input.clientKey ?? null, takenAt: input.takenAt ?? null })
    .onConflictDoNothing({ target: [attachments.uploadedBy, attachments.clientKey] })
    .returning();
  return row ?? null;
}

/** The upload a person already made under a device key, if any. */
export async function findAttachmentByClientKey(uploadedBy: string, clientKey: string): Promise<AttachmentRow | null> {
  const [row] = await db()
    .select()
    .from(attachments)
    .where(and(eq(attachments.uploadedBy, uploadedBy), eq(attachments.clientKey, clientKey)))
    .limit(1);
  return row ?? null;
}

export async function getAttachment(id: string): Promise<AttachmentRow | null> {
  const [row] = await db().select().from(attachments).where(eq(attachments.id, id)).limit(1);
  return row ?? null;
}

/**
 * `sizeBytes` is the stored file's size, which re-encoding a photo changes; a converted HEIC photo
 * also changes its type and name.
 */
export async function markAttachmentReady(id: string, thumbKey: string | null, sizeBytes: number, stored?: { contentType: string; fileName: string }): Promise<AttachmentRow> {
  const [row] = await db()
    .update(attachments)
    .set({ status: "ready", thumbKey, sizeBytes, ...(stored ?? {}) })
    .where(eq(attachments.id, id))
    .returning();
  return row;
}

export type PhotoView = AttachmentRow & { uploadedByName: string };

/** A project's finished uploads that aren't voided, oldest first, with who sent each. */
export async function listProjectAttachments(projectId: string): Promise<PhotoView[]> {
  const rows = await db()
    .select({ a: attachments, name: users.name })
    .from(attachments)
    .innerJoin(users, eq(users.id, attachments.uploadedBy))
    .where(and(eq(attachments.projectId, projectId), eq(attachments.status, "ready"), isNull(attachments.voidedAt)))
    .orderBy(asc(attachments.uploadedAt));
  return rows.map((r) => ({ ...r.a, uploadedByName: r.name }));
}

/** Voided photos, for the team's record: who voided each and why. */
export async function listVoidedPhotos(projectId: string) {
  return db()
    .select({ id: attachments.id, fileName: attachments.fileName, caption: attachments.caption, voidedAt: attachments.voidedAt, voidReason: attachments.voidReason, byName: users.name })
    .from(attachments)
    .innerJoin(users, eq(users.id, attachments.voidedBy))
    .where(and(eq(attachments.projectId, projectId), isNotNull(attachments.voidedAt)))
    .orderBy(asc(attachments.voidedAt));
}
