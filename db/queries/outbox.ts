import { and, desc, eq, inArray, isNull, sql } from "drizzle-orm";
import { db, type Db, type Tx } from "../index";
import { notices, notificationPrefs, users, company } from "../schema";
import type { Email } from "../../lib/mail/layout";
import { env } from "../../env";

export type NoticeKind = "invitation" | "stage_change" | "cycle_ready" | "shared_note" | "message" | "receipt" | "visit_report";

/**
 * Writes an e-mail to the outbox inside the caller's transaction and queues the job that sends it,
 * so the notice exists if and only if the change that caused it was committed. Returns null when
 * the recipient has turned this kind of notice off.
 */
export async function enqueueNotice(
  tx: Tx | Db,
  opts: {
    kind: NoticeKind;
    projectId?: string | null;
    recipientId: string;
    toEmail: string;
    email: Email;
    /** Held in the outbox until then, so the change can still be taken back. */
    sendAfter?: Date;
    source?: string;
    meta?: Record<string, unknown>;
  },
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
      sendAfter: opts.sendAfter ?? new Date(),
      source: opts.source ?? null,
      meta: opts.meta ?? null,
    })
    .returning({ id: notices.id, sendAfter: notices.sendAfter });
  await queueSend(tx, row.id, row.sendAfter);
  return row.id;
}

/** Seconds a client notice waits in the outbox: the company's setting, else the deployment's default. */
export async function noticeDelaySeconds(tx: Tx | Db): Promise<number> {
  const [row] = await tx.select({ seconds: company.noticeDelaySeconds }).from(company).limit(1);
  return row?.seconds ?? env().NOTICE_DELAY_SECONDS;
}

/** The company's own notice delay in seconds, or null when it uses the deployment's default. */
export async function getCompanyNoticeDelay(): Promise<number | null> {
  const [row] = await db().select({ seconds: company.noticeDelaySeconds }).from(company).limit(1);
  return row?.seconds ?? null;
}

/** When a notice queued now may leave. */
export async function noticeSendAfter(tx: Tx | Db, now = new Date()): Promise<Date> {
  return new Date(now.getTime() + (await noticeDelaySeconds(tx)) * 1000);
}

export type PendingNotice = { id: string; recipientId: string | null; sendAfter: Date; meta: Record<string, unknown> | null };

/** Notices from one source that have not left yet (the worker locks a row while it sends, so this waits for it). */
export async function pendingNotices(tx: Tx, source: string): Promise<PendingNotice[]> {
  return tx
    .select({ id: notices.id, recipientId: notices.recipientId, sendAfter: notices.sendAfter, meta: notices.meta })
    .from(notices)
    .where(and(eq(notices.source, source), inArray(notices.status, ["waiting", "failed"]), isNull(notices.sentAt)))
    .for("update");
}

/** Takes notices back before they leave: they stay in the outbox as withdrawn, and their jobs are removed. */
export async function withdrawNotices(tx: Tx, ids: string[], now = new Date()): Promise<number> {
  if (!ids.length) return 0;
  const rows = await tx
    .update(notices)
    .set({ status: "withdrawn", withdrawnAt: now })
    .where(and(inArray(notices.id, ids), inArray(notices.status, ["waiting", "failed"])))
    .returning({ id: notices.id });
  for (const r of rows) await tx.execute(sql`select graphile_worker.remove_job(${"notice:" + r.id})`);
  return rows.length;
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
      sendAfter: notices.sendAfter,
      held: sql<boolean>`${notices.sendAfter} > now()`,
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
      .returning({ id: notices.id, sendAfter: notices.sendAfter });
    // "Retry now" never sends a notice before its hold ends.
    const now = Date.now();
    for (const r of rows) await queueSend(tx, r.id, new Date(Math.max(now, r.sendAfter.getTime())));
    return rows.length;
  });
}

/**
 * One queue job per notice, keyed by the notice: queueing again replaces a job still waiting for
 * its next retry, so "retry now" runs it at once rather than adding a second copy.
 */
export async function queueSend(tx: Tx | Db, noticeId: string, runAt: Date) {
  await tx.execute(
    sql`select graphile_worker.add_job('send_notice', json_build_object('noticeId', ${noticeId}::text), run_at => ${runAt.toISOString()}::timestamptz, max_attempts => 8, job_key => ${"notice:" + noticeId})`,
  );
}
