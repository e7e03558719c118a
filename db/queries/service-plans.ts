import "server-only";
import { and, asc, eq, gt, inArray, isNull, notExists, or, sql } from "drizzle-orm";
import { db, type Db, type Tx } from "../index";
import { company, projectCrew, projects, servicePlans, serviceTaskTemplate, users, visitReports, visits } from "../schema";
import { MATERIALISE_AHEAD_DAYS, occurrencesBetween } from "../../lib/service/recurrence";
import { badRequest, conflict, notFound } from "../../server/errors";

export type ServicePlan = typeof servicePlans.$inferSelect;

/** The company's time zone, in which plans recur (UTC until the lead sets one). */
export async function companyTimeZone(tx: Tx | Db = db()): Promise<string> {
  const [row] = await tx.select({ tz: company.timeZone }).from(company).limit(1);
  return row?.tz || "UTC";
}

/** The tank's live plan, or null. */
export async function getServicePlan(projectId: string, tx: Tx | Db = db()): Promise<ServicePlan | null> {
  const [row] = await tx
    .select()
    .from(servicePlans)
    .where(and(eq(servicePlans.projectId, projectId), isNull(servicePlans.endedAt)))
    .limit(1);
  return row ?? null;
}

/** The routine-visit tasks a new plan starts from, in order. */
export async function getServiceTaskTemplate(): Promise<string[]> {
  const rows = await db().select({ label: serviceTaskTemplate.label }).from(serviceTaskTemplate).where(isNull(serviceTaskTemplate.retiredAt)).orderBy(asc(serviceTaskTemplate.position));
  return rows.map((r) => r.label);
}

/** Replaces the template: labels no longer listed are retired (kept), new ones added, all reordered. */
export async function setServiceTaskTemplate(labels: string[], now = new Date()) {
  await db().transaction(async (tx) => {
    await tx.execute(sql`lock table ${serviceTaskTemplate} in share row exclusive mode`);
    const current = await tx.select().from(serviceTaskTemplate).where(isNull(serviceTaskTemplate.retiredAt));
    const byLabel = new Map(current.map((r) => [r.label, r]));
    const keep = new Set(labels);
    const retire = current.filter((r) => !keep.has(r.label)).map((r) => r.id);
    if (retire.length) await tx.update(serviceTaskTemplate).set({ retiredAt: now }).where(inArray(serviceTaskTemplate.id, retire));
    for (const [position, label] of labels.entries()) {
      const row = byLabel.get(label);
      if (row) await tx.update(serviceTaskTemplate).set({ position }).where(eq(serviceTaskTemplate.id, row.id));
      else await tx.insert(serviceTaskTemplate).values({ label, position });
    }
  });
}

/** People who may be given a tank's visits: its crew and any lead. */
export async function assignablePeople(projectId: string, tx: Tx | Db = db()) {
  return tx
    .select({ id: users.id, name: users.name, role: users.role })
    .from(users)
    .where(
      and(
        isNull(users.deactivatedAt),
        or(eq(users.role, "lead"), and(eq(users.role, "crew"), sql`exists (select 1 from ${projectCrew} pc where pc.project_id = ${projectId} and pc.user_id = ${users.id})`)),
      ),
    )
    .orderBy(asc(users.name));
}

async function checkAssignee(tx: Tx, projectId: string, userId: string | null) {
  if (!userId) return;
  const people = await assignablePeople(projectId, tx);
  if (!people.some((p) => p.id === userId)) throw badRequest("Choose someone on this tank's crew, or a lead.", { usualAssigneeId: "Not on this tank's crew." });
}

/**
 * Writes the plan's visits for the next weeks as rows. Each (plan, series date) is inserted once:
 * a visit moved, skipped or signed off keeps its row, so running this again never recreates or
 * moves it back. Returns how many rows were new.
 */
export async function materialisePlan(tx: Tx | Db, plan: ServicePlan, timeZone: string, now = new Date()): Promise<number> {
  if (plan.endedAt) return 0;
  const to = new Date(now.getTime() + MATERIALISE_AHEAD_DAYS * 86_400_000);
  const due = occurrencesBetween({ rule: plan.rule, startsOn: plan.startsOn, startTime: plan.startTime, timeZone }, now, to);
  if (!due.length) return 0;
  const rows = await tx
    .insert(visits)
    .values(
      due.map((o) => ({
        projectId: plan.projectId,
        kind: "service visit" as const,
        startsAt: o.startsAt,
        durationMinutes: plan.durationMinutes,
        assignedTo: plan.usualAssigneeId,
        servicePlanId: plan.id,
        occurrenceOn: o.occurrenceOn,
        createdBy: plan.createdBy,
      })),
    )
    .onConflictDoNothing({ target: [visits.servicePlanId, visits.occurrenceOn] })
    .returning({ id: visits.id });
  return rows.length;
}

/** Future visits of a plan nobody has touched: not moved, skipped, signed off or reported on. */
function untouchedFuture(planId: string, now: Date) {
  return and(
    eq(visits.servicePlanId, planId),
    gt(visits.startsAt, now),
    isNull(visits.updatedAt),
    isNull(visits.cancelledAt),
    isNull(visits.completedAt),
    notExists(db().select({ one: sql`1` }).from(visitReports).where(eq(visitReports.visitId, visits.id))),
  );
}

export type PlanInput = {
  rule: string;
  startsOn: string;
  startTime: string;
  durationMinutes: number;
  waterChangePercent: number;
  tasks: string[];
  usualAssigneeId: string | null;
  /** The version the editor loaded; a stale save is refused rather than overwriting someone else's. */
  version?: number | null;
};

/**
 * Creates or changes the tank's plan and writes its coming visits, in one transaction. A change to
 * the timing (rule, start, time, length) replaces the future visits nobody has touched; moved,
 * skipped and completed ones stay. A new usual assignee takes over the untouched ones.
 */
export async function saveServicePlan(opts: { projectId: string; by: string; input: PlanInput }, now = new Date()) {
  return db().transaction(async (tx) => {
    await tx.select({ id: projects.id }).from(projects).where(eq(projects.id, opts.projectId)).for("update");
    await checkAssignee(tx, opts.projectId, opts.input.usualAssigneeId);
    const timeZone = await companyTimeZone(tx);
    const existing = await getServicePlan(opts.projectId, tx);
    const values = {
      rule: opts.input.rule,
      startsOn: opts.input.startsOn,
      startTime: opts.input.startTime,
      durationMinutes: opts.input.durationMinutes,
      waterChangePercent: opts.input.waterChangePercent,
      tasks: opts.input.tasks,
      usualAssigneeId: opts.input.usualAssigneeId,
    };
    let plan: ServicePlan;
    let replaced = 0;
    if (!existing) {
      [plan] = await tx.insert(servicePlans).values({ projectId: opts.projectId, createdBy: opts.by, ...values }).returning();
    } else {
      if (opts.input.version != null && opts.input.version !== existing.version) {
        throw conflict("Someone else changed this plan while you were editing it. Reload to see their change, then make yours again.");
      }
      const timingChanged =
        existing.rule !== values.rule || existing.startsOn !== values.startsOn || existing.startTime !== values.startTime || existing.durationMinutes !== values.durationMinutes;
      if (timingChanged) {
        // Rows the plan wrote and nobody touched are the plan's own output, not anyone's entry: replacing them keeps the calendar true.
        const gone = await tx.delete(visits).where(untouchedFuture(existing.id, now)).returning({ id: visits.id });
        replaced = gone.length;
      } else if (existing.usualAssigneeId !== values.usualAssigneeId) {
        await tx.update(visits).set({ assignedTo: values.usualAssigneeId }).where(untouchedFuture(existing.id, now));
      }
      [plan] = await tx
        .update(servicePlans)
        .set({ ...values, updatedAt: now, version: sql`${servicePlans.version} + 1` })
        .where(eq(servicePlans.id, existing.id))
        .returning();
    }
    const added = await materialisePlan(tx, plan, timeZone, now);
    return { plan, added, replaced };
  });
}

/** The periodic job: tops up every live plan's coming visits. Idempotent; safe on several workers at once. */
export async function materialiseAllPlans(now = new Date()): Promise<number> {
  const timeZone = await companyTimeZone();
  const plans = await db().select().from(servicePlans).where(isNull(servicePlans.endedAt));
  let added = 0;
  for (const plan of plans) added += await materialisePlan(db(), plan, timeZone, now);
  return added;
}

/** A tank's routine visits, soonest first, with who does each and whether it has a report. */
export async function listServiceVisits(projectId: string) {
  return db()
    .select({
      id: visits.id,
      startsAt: visits.startsAt,
      durationMinutes: visits.durationMinutes,
      occurrenceOn: visits.occurrenceOn,
      assignedTo: visits.assignedTo,
      assigneeName: users.name,
      completedAt: visits.completedAt,
      cancelledAt: visits.cancelledAt,
      cancelReason: visits.cancelReason,
      moved: sql<boolean>`${visits.updatedAt} is not null`,
    })
    .from(visits)
    .leftJoin(users, eq(users.id, visits.assignedTo))
    .where(and(eq(visits.projectId, projectId), eq(visits.kind, "service visit")))
    .orderBy(asc(visits.startsAt));
}

async function openServiceVisit(tx: Tx, projectId: string, visitId: string) {
  const [row] = await tx
    .select()
    .from(visits)
    .where(and(eq(visits.id, visitId), eq(visits.projectId, projectId), eq(visits.kind, "service visit")))
    .for("update");
  if (!row) throw notFound("That visit");
  if (row.cancelledAt) throw conflict("That visit was skipped; book a new one instead of moving it.");
  if (row.completedAt) throw conflict("That visit is signed off; it can't be moved or skipped.");
  return row;
}

/** Moves one visit to another time or person. It keeps its series date, so the plan won't recreate it. */
export async function moveServiceVisit(opts: { projectId: string; visitId: string; startsAt: Date; assignedTo: string | null }, now = new Date()) {
  return db().transaction(async (tx) => {
    await openServiceVisit(tx, opts.projectId, opts.visitId);
    if (opts.assignedTo) {
      const people = await assignablePeople(opts.projectId, tx);
      if (!people.some((p) => p.id === opts.assignedTo)) throw badRequest("Choose someone on this tank's crew, or a lead.", { assignedTo: "Not on this tank's crew." });
    }
    const [row] = await tx
      .update(visits)
      .set({ startsAt: opts.startsAt, assignedTo: opts.assignedTo, updatedAt: now })
      .where(eq(visits.id, opts.visitId))
      .returning();
    return row;
  });
}

/** Skips one visit with a reason; it stays on record, and the series goes on. */
export async function skipServiceVisit(opts: { projectId: string; visitId: string; by: string; reason: string }, now = new Date()) {
  return db().transaction(async (tx) => {
    await openServiceVisit(tx, opts.projectId, opts.visitId);
    const [row] = await tx
      .update(visits)
      .set({ cancelledAt: now, cancelledBy: opts.by, cancelReason: opts.reason, updatedAt: now })
      .where(eq(visits.id, opts.visitId))
      .returning();
    return row;
  });
}
