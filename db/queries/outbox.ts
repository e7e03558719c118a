import { and, desc, eq, inArray, sql } from "drizzle-orm";
import type { Db, Tx } from "../index";
import { notices, notificationPrefs, users, company } from "../schema";
import type { Email } from "../../lib/mail/layout";

export type NoticeKind = "invitation" | "stage_change" | "cycle_ready" | "shared_note" | "message" | "receipt";

/**
 * Writes an e-mail to the outbox inside the caller's transaction and queues the job that sends it,
 * so the notice exists if and only if the change that caused it was committed. Returns null when
 * the recipient has turned this kind of notice off.
 */
export async function enqueueNotice(
  tx: Tx | Db,
  opts: { kind: NoticeKind; projectId?: string | null; recipientId: string; toEmail: string; email: Email },
): Promise<string | null> {
  // Invitations and payment receipts always go: they are not notices a person can turn off.
  if (opts.kind !== "invitation" && opts.kind !== "receipt") {
    const [pref] = await tx
      .select({ enabled: notificationPrefs.enabled })
      .from(notificationPrefs)
      .where(and(eq(notificationPrefs.userId, opts.recipientId), eq(notificationPrefs.kind, opts.kind)));
    if (pref && !pref.enabled) return null;
  }
  const [row] = await tx
    .insert(notices)
    .values({
      kind: opts.kind,
      projectId: opts.projectId ?? null,
      recipientId: opts.recipientId,
      toEmail: opts.toEmail,
      subject: opts.email.subject,
      text: opts.email.text,
      html: opts.email.html,
    })
    .returning({ id: notices.id });
  await queueSend(tx, row.id);
  return row.id;
}

export async function companyName(tx: Tx | Db): Promise<string> {
  const [row] = await tx.select({ name: company.name }).from(company).limit(1);
  return row?.name ?? "Your aquarium installer";
}

/** Notices not yet delivered, newest first, for the lead's outbox page. */
export async function listUndelivered(db: Db) {
  return db
    .select({
      id: notices.id,
      kind: notices.kind,
      toEmail: notices.toEmail,
      subject: notices.subject,
      status: notices.status,
      attempts: notices.attempts,
      lastError: notices.lastError,
      createdAt: notices.createdAt,
      recipientName: users.name,
    })
    .from(notices)
    .leftJoin(users, eq(users.id, notices.recipientId))
    .where(inArray(notices.status, ["waiting", "failed"]))
    .orderBy(desc(notices.createdAt))
    .limit(200);
}

/** Puts failed or waiting notices back at the front of the queue. */
export async function retryNotices(db: Db, ids: string[]): Promise<number> {
  if (!ids.length) return 0;
  return db.transaction(async (tx) => {
    const rows = await tx
      .update(notices)
      .set({ status: "waiting", lastError: null })
      .where(and(inArray(notices.id, ids), inArray(notices.status, ["waiting", "failed"])))
      .returning({ id: notices.id });
    for (const r of rows) await queueSend(tx, r.id);
    return rows.length;
  });
}

/**
 * One queue job per notice, keyed by the notice: queueing again replaces a job still waiting for
 * its next retry, so "retry now" runs it at once rather than adding a second copy.
 */
async function queueSend(tx: Tx | Db, noticeId: string) {
  await tx.execute(
    sql`select graphile_worker.add_job('send_notice', json_build_object('noticeId', ${noticeId}::text), max_attempts => 8, job_key => ${"notice:" + noticeId})`,
  );
}
