import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import { db } from "../index";
import { attachments } from "../schema";
import { notFound } from "../../server/errors";

/** Changes a photo's caption (an empty caption removes it). Null when the photo isn't on this project. */
export async function recaptionPhoto(projectId: string, attachmentId: string, caption: string | null) {
  const [row] = await db()
    .update(attachments)
    .set({ caption })
    .where(and(eq(attachments.id, attachmentId), eq(attachments.projectId, projectId), eq(attachments.status, "ready"), isNull(attachments.voidedAt)))
    .returning();
  if (!row) throw notFound("That photo");
  return row;
}

/** Voids a photo with a reason: it leaves the galleries and the client's timeline but stays on record. */
export async function voidPhoto(projectId: string, attachmentId: string, by: string, reason: string, now = new Date()) {
  const [row] = await db()
    .update(attachments)
    .set({ voidedAt: now, voidedBy: by, voidReason: reason })
    .where(and(eq(attachments.id, attachmentId), eq(attachments.projectId, projectId), isNull(attachments.voidedAt)))
    .returning();
  if (!row) throw notFound("That photo");
  return row;
}
