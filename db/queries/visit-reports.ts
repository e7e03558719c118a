import "server-only";
import { and, asc, desc, eq, isNotNull, isNull, sql } from "drizzle-orm";
import { db, type Tx } from "../index";
import { attachments, livestockGroups, projects, servicePlans, users, visitReportPhotos, visitReports, visitTaskTicks, visits, waterTests } from "../schema";
import { companyName, enqueueNotice } from "./outbox";
import { companyTimeZone } from "./service-plans";
import { equipmentServicedOnVisit } from "./visit-equipment";
import { getDesignVolume, type ReadingValues } from "./water";
import { mayEditReport, reopenRefusal, signOffRefusal, type Signer } from "../../lib/service/sign-off";
import { waterChangeLitres } from "../../lib/service/water-change-volume";
import { localDay } from "../../lib/service/local-dates";
import { visitReportEmail, waterTestLine } from "../../lib/mail/visit-report-email";
import { AppError, badRequest, conflict, forbidden, notFound } from "../../server/errors";
import { env } from "../../env";

type VisitRow = typeof visits.$inferSelect;

async function loadVisit(tx: Tx | ReturnType<typeof db>, projectId: string, visitId: string, lock = false): Promise<VisitRow> {
  const q = tx
    .select()
    .from(visits)
    .where(and(eq(visits.id, visitId), eq(visits.projectId, projectId), eq(visits.kind, "service visit")));
  const [row] = lock ? await q.for("update") : await q;
  if (!row) throw notFound("That visit");
  return row;
}

/** The report row, made on the first write with the plan's tasks copied in (so later plan edits leave it alone). */
async function ensureReport(tx: Tx, visit: VisitRow) {
  const [plan] = visit.servicePlanId ? await tx.select({ tasks: servicePlans.tasks, percent: servicePlans.waterChangePercent }).from(servicePlans).where(eq(servicePlans.id, visit.servicePlanId)) : [];
  const litres = plan ? waterChangeLitres(plan.percent, await getDesignVolume(visit.projectId)) : null;
  await tx
    .insert(visitReports)
    .values({ visitId: visit.id, projectId: visit.projectId, tasks: plan?.tasks ?? [], waterChangeL: litres })
    .onConflictDoNothing({ target: visitReports.visitId });
  const [row] = await tx.select().from(visitReports).where(eq(visitReports.visitId, visit.id));
  return row;
}

function assertEditable(who: Signer, visit: VisitRow) {
  if (mayEditReport(who, visit)) return;
  if (visit.cancelledAt) throw conflict("This visit was skipped, so its report can't be filled in.");
  if (visit.completedAt) throw conflict("This report is signed off and locked. The lead can reopen it with a reason.");
  throw forbidden("Only the lead or the crew on this tank can fill in a visit report.");
}

/** Each task's current state: the newest tick per task wins. */
async function taskStates(visitId: string, tasks: string[]) {
  const ticks = await db()
    .select({ taskIndex: visitTaskTicks.taskIndex, done: visitTaskTicks.done, at: visitTaskTicks.at, byName: users.name })
    .from(visitTaskTicks)
    .innerJoin(users, eq(users.id, visitTaskTicks.byUserId))
    .where(eq(visitTaskTicks.visitId, visitId))
    .orderBy(asc(visitTaskTicks.seq));
  const latest = new Map<number, (typeof ticks)[number]>();
  for (const t of ticks) latest.set(t.taskIndex, t);
  return tasks.map((label, index) => {
    const t = latest.get(index);
    return { index, label, done: t?.done ?? false, at: t?.at ?? null, byName: t?.byName ?? null };
  });
}

export type ReportAudience = "team" | "client";

/**
 * A visit and its report as the caller may read it. Reading writes nothing: before the first save
 * the tasks and litres come from the plan. A client sees only signed-off reports, never the
 * internal notes.
 */
export async function getVisitReport(opts: { projectId: string; visitId: string; audience: ReportAudience }) {
  const visit = await loadVisit(db(), opts.projectId, opts.visitId);
  if (opts.audience === "client" && !visit.completedAt) throw notFound("That visit report");
  const [[report], [plan], [assignee], volume, tz, photos, [livestock]] = await Promise.all([
    db().select().from(visitReports).where(eq(visitReports.visitId, visit.id)),
    visit.servicePlanId ? db().select().from(servicePlans).where(eq(servicePlans.id, visit.servicePlanId)) : Promise.resolve([]),
    visit.assignedTo ? db().select({ name: users.name }).from(users).where(eq(users.id, visit.assignedTo)) : Promise.resolve([]),
    getDesignVolume(visit.projectId),
    companyTimeZone(),
    db()
      .select({ id: attachments.id, fileName: attachments.fileName, caption: attachments.caption })
      .from(visitReportPhotos)
      .innerJoin(attachments, eq(attachments.id, visitReportPhotos.attachmentId))
      .where(and(eq(visitReportPhotos.visitId, visit.id), isNull(attachments.voidedAt), eq(attachments.status, "ready")))
      .orderBy(asc(visitReportPhotos.createdAt)),
    db().select({ n: sql<number>`count(*)::int` }).from(livestockGroups).where(eq(livestockGroups.projectId, visit.projectId)),
  ]);
  const tasks = report?.tasks ?? plan?.tasks ?? [];
  const suggestedL = plan ? waterChangeLitres(plan.waterChangePercent, volume) : null;
  const [waterTest] = report?.waterTestId ? await db().select().from(waterTests).where(eq(waterTests.id, report.waterTestId)) : [];
  const [signer] = report?.signedOffBy ? await db().select({ name: users.name }).from(users).where(eq(users.id, report.signedOffBy)) : [];
  return {
    visit: {
      id: visit.id,
      startsAt: visit.startsAt,
      localDay: localDay(visit.startsAt, tz),
      assignedTo: visit.assignedTo,
      assigneeName: assignee?.name ?? null,
      completedAt: visit.completedAt,
      cancelledAt: visit.cancelledAt,
      cancelReason: visit.cancelReason,
    },
    timeZone: tz,
    tasks: await taskStates(visit.id, tasks),
    waterChangePercent: plan?.waterChangePercent ?? null,
    suggestedL,
    waterChangeL: report?.waterChangeL ?? suggestedL,
    waterTest: waterTest && !waterTest.voidedAt ? waterTest : null,
    livestockNote: report?.livestockNote ?? null,
    hasLivestockRecord: (livestock?.n ?? 0) > 0,
    clientNotes: report?.clientNotes ?? null,
    internalNotes: opts.audience === "team" ? (report?.internalNotes ?? null) : null,
    photos,
    equipmentServiced: await equipmentServicedOnVisit(visit.id),
    signedOffByName: signer?.name ?? null,
    reopenedAt: report?.reopenedAt ?? null,
    reopenReason: opts.audience === "team" ? (report?.reopenReason ?? null) : null,
  };
}

export type VisitReportView = Awaited<ReturnType<typeof getVisitReport>>;

/**
 * Ticks or unticks one of the visit's tasks. The device's key makes a retried save land once: a key
 * already stored answers with that tick (replayed) and changes nothing, even after sign-off.
 */
export async function recordVisitTick(opts: { projectId: string; visitId: string; who: Signer; userId: string; taskIndex: number; done: boolean; clientKey: string }) {
  return db().transaction(async (tx) => {
    const [replay] = await tx.select().from(visitTaskTicks).where(eq(visitTaskTicks.clientKey, opts.clientKey)).limit(1);
    if (replay) {
      if (replay.visitId !== opts.visitId || replay.taskIndex !== opts.taskIndex) throw conflict("That save key was already used for another task. Reload the page and tick again.");
      return { tick: replay, replayed: true };
    }
    const visit = await loadVisit(tx, opts.projectId, opts.visitId, true);
    assertEditable(opts.who, visit);
    const report = await ensureReport(tx, visit);
    if (opts.taskIndex >= report.tasks.length) throw notFound("That task");
    const [tick] = await tx
      .insert(visitTaskTicks)
      .values({ visitId: visit.id, taskIndex: opts.taskIndex, done: opts.done, clientKey: opts.clientKey, byUserId: opts.userId })
      .onConflictDoNothing({ target: visitTaskTicks.clientKey })
      .returning();
    if (!tick) throw new AppError(409, "That save clashed with another. Try again.");
    await tx.update(visitReports).set({ updatedAt: new Date() }).where(eq(visitReports.visitId, visit.id));
    return { tick, replayed: false };
  });
}

export type ReportFields = { waterChangeL?: number | null; livestockNote?: string | null; clientNotes?: string | null; internalNotes?: string | null };

/** Saves the report's written parts; fields left out keep their value. */
export async function updateVisitReport(opts: { projectId: string; visitId: string; who: Signer; fields: ReportFields }) {
  return db().transaction(async (tx) => {
    const visit = await loadVisit(tx, opts.projectId, opts.visitId, true);
    assertEditable(opts.who, visit);
    await ensureReport(tx, visit);
    const set: Partial<typeof visitReports.$inferInsert> = { updatedAt: new Date() };
    for (const k of ["waterChangeL", "livestockNote", "clientNotes", "internalNotes"] as const) if (opts.fields[k] !== undefined) (set as Record<string, unknown>)[k] = opts.fields[k];
    const [row] = await tx.update(visitReports).set(set).where(eq(visitReports.visitId, visit.id)).returning();
    return row;
  });
}

/** Records the visit's water test (the project's usual water-test record) and puts it on the report, replacing an earlier one. */
export async function recordVisitWaterTest(opts: { projectId: string; visitId: string; who: Signer; userId: string; values: ReadingValues }) {
  return db().transaction(async (tx) => {
    const visit = await loadVisit(tx, opts.projectId, opts.visitId, true);
    assertEditable(opts.who, visit);
    const report = await ensureReport(tx, visit);
    const now = new Date();
    if (report.waterTestId) {
      await tx
        .update(waterTests)
        .set({ voidedAt: now, voidedBy: opts.userId, voidReason: "Replaced by a new test on the same visit" })
        .where(and(eq(waterTests.id, report.waterTestId), isNull(waterTests.voidedAt)));
    }
    const [test] = await tx.insert(waterTests).values({ projectId: opts.projectId, takenBy: opts.userId, ...opts.values }).returning();
    await tx.update(visitReports).set({ waterTestId: test.id, updatedAt: now }).where(eq(visitReports.visitId, visit.id));
    return test;
  });
}

/** Puts a photo uploaded to the project on the visit's report. */
export async function addVisitPhoto(opts: { projectId: string; visitId: string; who: Signer; userId: string; attachmentId: string }) {
  return db().transaction(async (tx) => {
    const visit = await loadVisit(tx, opts.projectId, opts.visitId, true);
    assertEditable(opts.who, visit);
    await ensureReport(tx, visit);
    const [photo] = await tx
      .select({ id: attachments.id, status: attachments.status })
      .from(attachments)
      .where(and(eq(attachments.id, opts.attachmentId), eq(attachments.projectId, opts.projectId), isNull(attachments.voidedAt)));
    if (!photo) throw notFound("That photo");
    if (photo.status !== "ready") throw badRequest("The photo isn't uploaded yet.", { attachmentId: "Wait for the photo to finish uploading." });
    await tx.insert(visitReportPhotos).values({ visitId: visit.id, attachmentId: photo.id, addedBy: opts.userId }).onConflictDoNothing();
    return { attachmentId: photo.id };
  });
}

/** Runs a write on an editable visit inside one transaction (used for equipment serviced). */
export async function withEditableVisit<T>(opts: { projectId: string; visitId: string; who: Signer }, run: (tx: Tx, visit: VisitRow) => Promise<T>): Promise<T> {
  return db().transaction(async (tx) => {
    const visit = await loadVisit(tx, opts.projectId, opts.visitId, true);
    assertEditable(opts.who, visit);
    await ensureReport(tx, visit);
    return run(tx, visit);
  });
}

const visitDateWords = (d: Date, tz: string) => new Intl.DateTimeFormat("en-GB", { timeZone: tz, weekday: "long", day: "numeric", month: "long", year: "numeric" }).format(d);

/**
 * Signs the report off: the visit is complete, the report locks, and the client is e-mailed the
 * plain report through the outbox once (a second sign-off after a reopen doesn't e-mail again).
 */
export async function signOffVisit(opts: { projectId: string; visitId: string; who: Signer; user: { id: string; name: string } }, now = new Date()) {
  return db().transaction(async (tx) => {
    const visit = await loadVisit(tx, opts.projectId, opts.visitId, true);
    const report = await ensureReport(tx, visit);
    const tz = await companyTimeZone(tx);
    const tasks = await taskStatesTx(tx, visit.id, report.tasks);
    const refusal = signOffRefusal(opts.who, {
      cancelledAt: visit.cancelledAt,
      completedAt: visit.completedAt,
      visitDay: localDay(visit.startsAt, tz),
      today: localDay(now, tz),
      tasksDone: tasks.filter((t) => t.done).length,
      clientNotes: report.clientNotes,
    });
    if (refusal) throw new AppError(refusal.status, refusal.message);
    await tx.update(visits).set({ completedAt: now }).where(eq(visits.id, visit.id));
    await tx.update(visitReports).set({ signedOffBy: opts.user.id, updatedAt: now }).where(eq(visitReports.visitId, visit.id));
    let emailed = false;
    if (!report.clientNotifiedAt) {
      const [project] = await tx.select().from(projects).where(eq(projects.id, visit.projectId));
      const [client] = await tx.select({ id: users.id, name: users.name, email: users.email }).from(users).where(eq(users.id, project.clientId));
      const [test] = report.waterTestId ? await tx.select().from(waterTests).where(and(eq(waterTests.id, report.waterTestId), isNull(waterTests.voidedAt))) : [];
      const equipment = await equipmentServicedOnVisit(visit.id, tx);
      const email = visitReportEmail({
        companyName: await companyName(tx),
        recipientName: client.name,
        projectTitle: project.title,
        visitDate: visitDateWords(visit.startsAt, tz),
        byName: opts.user.name,
        tasksDone: tasks.filter((t) => t.done).map((t) => t.label),
        tasksNotDone: tasks.filter((t) => !t.done).map((t) => t.label),
        waterChangeL: report.waterChangeL,
        waterTest: test ? waterTestLine(test) : null,
        equipment: equipment.map((e) => [e.kind, e.makeModel].filter(Boolean).join(" ")),
        livestockNote: report.livestockNote,
        clientNotes: report.clientNotes,
        url: `${env().APP_URL}/projects/${project.id}/service/visits/${visit.id}`,
      });
      const id = await enqueueNotice(tx, { kind: "visit_report", projectId: project.id, recipientId: client.id, toEmail: client.email, email, source: `visit:${visit.id}` });
      emailed = id != null;
      await tx.update(visitReports).set({ clientNotifiedAt: now }).where(eq(visitReports.visitId, visit.id));
    }
    return { completedAt: now, emailed };
  });
}

async function taskStatesTx(tx: Tx, visitId: string, tasks: string[]) {
  const ticks = await tx.select({ taskIndex: visitTaskTicks.taskIndex, done: visitTaskTicks.done }).from(visitTaskTicks).where(eq(visitTaskTicks.visitId, visitId)).orderBy(asc(visitTaskTicks.seq));
  const latest = new Map<number, boolean>();
  for (const t of ticks) latest.set(t.taskIndex, t.done);
  return tasks.map((label, i) => ({ label, done: latest.get(i) ?? false }));
}

/** The lead reopens a signed-off report with a reason kept on it; the visit is no longer complete. */
export async function reopenVisitReport(opts: { projectId: string; visitId: string; who: Signer; userId: string; reason: string }, now = new Date()) {
  return db().transaction(async (tx) => {
    const visit = await loadVisit(tx, opts.projectId, opts.visitId, true);
    const refusal = reopenRefusal(opts.who, visit);
    if (refusal) throw new AppError(refusal.status, refusal.message);
    await tx.update(visits).set({ completedAt: null }).where(eq(visits.id, visit.id));
    await tx.update(visitReports).set({ reopenedAt: now, reopenedBy: opts.userId, reopenReason: opts.reason, updatedAt: now }).where(eq(visitReports.visitId, visit.id));
    return { reopenedAt: now };
  });
}

/** Signed-off visits of a tank, newest first, for the Service tab and the portal. */
export async function listSignedOffVisits(projectId: string, limit = 20) {
  return db()
    .select({ id: visits.id, startsAt: visits.startsAt, completedAt: visits.completedAt, clientNotes: visitReports.clientNotes, byName: users.name })
    .from(visits)
    .leftJoin(visitReports, eq(visitReports.visitId, visits.id))
    .leftJoin(users, eq(users.id, visitReports.signedOffBy))
    .where(and(eq(visits.projectId, projectId), eq(visits.kind, "service visit"), isNotNull(visits.completedAt)))
    .orderBy(desc(visits.startsAt))
    .limit(limit);
}
