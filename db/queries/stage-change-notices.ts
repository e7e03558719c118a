import "server-only";
import { eq, inArray } from "drizzle-orm";
import type { Tx } from "../index";
import { projects, users } from "../schema";
import { companyName, enqueueNotice, noticeSendAfter, pendingNotices, withdrawNotices } from "./outbox";
import { stageChangeEmail } from "../../lib/mail/stage-change-email";
import type { Stage } from "../../lib/stages/stages";
import { env } from "../../env";

/** The outbox source of a project's stage-change notices. */
export const stageNoticeSource = (projectId: string) => `stage:${projectId}`;

/**
 * Queues the e-mails a stage change causes (to the client and the lead), inside the transaction
 * that makes the change, so a notice exists exactly when the change was committed. Each waits out
 * the company's notice delay; a move that undoes one still waiting takes that notice back and
 * sends nothing, so a slip corrected at once reaches nobody.
 */
export async function queueStageChangeNotices(
  tx: Tx,
  change: { projectId: string; fromStage: Stage; toStage: Stage; byUserId: string; override: boolean; reason: string | null },
  now = new Date(),
): Promise<void> {
  const source = stageNoticeSource(change.projectId);
  const pending = await pendingNotices(tx, source);
  const undone = pending.filter((n) => n.meta?.fromStage === change.toStage && n.meta?.toStage === change.fromStage);
  const undoneFor = new Set(undone.map((n) => n.recipientId));
  await withdrawNotices(tx, undone.map((n) => n.id), now);
  const sendAfter = await noticeSendAfter(tx, now);
  const [project] = await tx
    .select({ id: projects.id, title: projects.title, clientId: projects.clientId, leadId: projects.leadId })
    .from(projects)
    .where(eq(projects.id, change.projectId));
  if (!project) return;
  const ids = [...new Set([project.clientId, project.leadId, change.byUserId].filter((x): x is string => !!x))];
  const people = await tx.select({ id: users.id, name: users.name, email: users.email }).from(users).where(inArray(users.id, ids));
  const byName = people.find((p) => p.id === change.byUserId)?.name ?? "The team";
  const company = await companyName(tx);
  const url = `${env().APP_URL}/projects/${project.id}`;
  const recipients = [...new Set([project.clientId, project.leadId])].filter((id): id is string => !!id && id !== change.byUserId);
  for (const id of recipients) {
    const person = people.find((p) => p.id === id);
    if (!person || undoneFor.has(id)) continue;
    const email = stageChangeEmail({
      companyName: company,
      recipientName: person.name,
      forClient: id === project.clientId,
      projectTitle: project.title,
      fromStage: change.fromStage,
      toStage: change.toStage,
      byName,
      override: change.override,
      reason: change.reason,
      url,
    });
    await enqueueNotice(tx, {
      kind: "stage_change",
      projectId: project.id,
      recipientId: person.id,
      toEmail: person.email,
      email,
      sendAfter,
      source,
      meta: { fromStage: change.fromStage, toStage: change.toStage },
    });
  }
}
