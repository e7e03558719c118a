import "server-only";
import { eq, and, isNull } from "drizzle-orm";
import { db, type Tx } from "../index";
import { company, projects, users } from "../schema";
import { getCycleEvaluation } from "./cycle-state";
import { companyName, enqueueNotice } from "./outbox";
import { cycleReadyEmail } from "../../lib/mail/cycle-ready-email";
import { env } from "../../env";
import { conflict } from "../../server/errors";
import type { CycleRules } from "../../lib/cycling/cycle-rules";

/**
 * Sends the "cycle ready" notice the first time a cycling project's gate opens. Runs inside the
 * transaction that changed the readings (or the rules), with the project row locked, so two
 * tests logged at once can't both send it and a rolled-back change never sends it.
 * Returns true when the notice was queued by this call.
 */
export async function notifyIfCycleReady(tx: Tx, projectId: string, now = new Date()): Promise<boolean> {
  const [project] = await tx
    .select({ id: projects.id, title: projects.title, stage: projects.stage, leadId: projects.leadId, clientId: projects.clientId, notifiedAt: projects.cycleReadyNotifiedAt })
    .from(projects)
    .where(eq(projects.id, projectId))
    .for("update");
  if (!project || project.notifiedAt || project.stage !== "cycling") return false;

  const evaluation = await getCycleEvaluation(projectId, now, tx);
  if (!evaluation.ready) return false;

  await tx.update(projects).set({ cycleReadyNotifiedAt: now }).where(eq(projects.id, projectId));
  const company = await companyName(tx);
  const url = `${env().APP_URL.replace(/\/$/, "")}/projects/${projectId}/water`;
  const recipientIds = [project.leadId, project.clientId].filter((id): id is string => !!id);
  for (const recipientId of new Set(recipientIds)) {
    const [person] = await tx.select({ name: users.name, email: users.email, role: users.role }).from(users).where(eq(users.id, recipientId));
    if (!person) continue;
    await enqueueNotice(tx, {
      kind: "cycle_ready",
      projectId,
      recipientId,
      toEmail: person.email,
      email: cycleReadyEmail({ companyName: company, name: person.name, projectTitle: project.title, url, forClient: person.role === "client" }),
    });
  }
  return true;
}

/** After the company's rules change: every cycling project not yet told, checked under the new rules. */
export async function notifyAllCycleReady(tx: Tx, now = new Date()): Promise<number> {
  const waiting = await tx
    .select({ id: projects.id })
    .from(projects)
    .where(and(eq(projects.stage, "cycling"), isNull(projects.cycleReadyNotifiedAt)));
  let sent = 0;
  for (const p of waiting) if (await notifyIfCycleReady(tx, p.id, now)) sent++;
  return sent;
}

/** Stores the company's rule overrides and re-checks waiting projects, in one transaction. */
export async function saveCompanyCycleRules(overrides: Partial<CycleRules>, now = new Date()) {
  return db().transaction(async (tx) => {
    const updated = await tx.update(company).set({ cycleRules: overrides, updatedAt: now }).where(eq(company.id, 1)).returning({ id: company.id });
    if (!updated.length) throw conflict("The company's record is missing; set the company up before changing its rules.");
    const notified = await notifyAllCycleReady(tx, now);
    return { notified };
  });
}
