import { eq, sql } from "drizzle-orm";
import type { Task } from "graphile-worker";
import { db } from "../../db";
import { notices } from "../../db/schema";
import { queueSend } from "../../db/queries/outbox";
import { mailTransport } from "../mailer";
import { env } from "../../env";

/**
 * Sends one notice from the outbox. The notice row is locked for the duration of the send and its
 * status checked first, so two workers can never both deliver it.
 */
export const sendNotice: Task = async (payload, helpers) => {
  const { noticeId } = payload as { noticeId: string };
  const failure = await db().transaction(async (tx) => {
    const [row] = await tx.select().from(notices).where(eq(notices.id, noticeId)).for("update");
    if (!row || row.status === "sent" || row.status === "withdrawn") return null;
    // Still held (a job queued without its hold): put it back for when the hold ends.
    if (row.sendAfter.getTime() > Date.now()) {
      await queueSend(tx, row.id, row.sendAfter);
      return null;
    }
    try {
      await mailTransport().sendMail({ from: env().MAIL_FROM, to: row.toEmail, subject: row.subject, text: row.text, html: row.html });
      await tx
        .update(notices)
        .set({ status: "sent", sentAt: new Date(), attempts: sql`${notices.attempts} + 1`, lastError: null })
        .where(eq(notices.id, noticeId));
      return null;
    } catch (error) {
      const lastAttempt = helpers.job.attempts >= helpers.job.max_attempts;
      await tx
        .update(notices)
        .set({
          status: lastAttempt ? "failed" : "waiting",
          attempts: sql`${notices.attempts} + 1`,
          lastError: error instanceof Error ? error.message.slice(0, 500) : String(error),
        })
        .where(eq(notices.id, noticeId));
      return error;
    }
  });
  // Thrown after the failure is committed, so the queue retries with its backoff and the lead sees why.
  if (failure) throw failure;
};
