import "server-only";
import { and, asc, eq } from "drizzle-orm";
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
}): Promise<AttachmentRow> {
  const [row] = await db()
    .insert(attachments)
    .values({ ...input, status: input.status ?? "pending", thumbKey: input.thumbKey ?? null })
    .returning();
  return row;
}

export async function getAttachment(id: string): Promise<AttachmentRow | null> {
  const [row] = await db().select().from(attachments).where(eq(attachments.id, id)).limit(1);
  return row ?? null;
}

/** `sizeBytes` is the stored file's size, which re-encoding a photo changes. */
export async function markAttachmentReady(id: string, thumbKey: string | null, sizeBytes: number): Promise<AttachmentRow> {
  const [row] = await db().update(attachments).set({ status: "ready", thumbKey, sizeBytes }).where(eq(attachments.id, id)).returning();
  return row;
}

export type PhotoView = AttachmentRow & { uploadedByName: string };

/** A project's finished uploads, oldest first, with who sent each. */
export async function listProjectAttachments(projectId: string): Promise<PhotoView[]> {
  const rows = await db()
    .select({ a: attachments, name: users.name })
    .from(attachments)
    .innerJoin(users, eq(users.id, attachments.uploadedBy))
    .where(and(eq(attachments.projectId, projectId), eq(attachments.status, "ready")))
    .orderBy(asc(attachments.uploadedAt));
  return rows.map((r) => ({ ...r.a, uploadedByName: r.name }));
}
