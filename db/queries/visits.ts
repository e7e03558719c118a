import "server-only";
import { randomBytes } from "node:crypto";
import { and, asc, eq, gte, inArray, isNull } from "drizzle-orm";
import { db } from "../index";
import { projects, users, visits } from "../schema";
import { visibleProjectsWhere } from "./project-access";
import type { SessionUser } from "../../server/session";
import { notFound } from "../../server/errors";
import type { visitKinds } from "../schema/visits";
import { installDateOf } from "../../lib/install/install-day-dates";
import { companyTimeZone } from "./service-plans";

export type VisitKind = (typeof visitKinds)[number];

/** A project's visits that haven't been cancelled, soonest first. */
export async function listVisits(projectId: string) {
  return db()
    .select({ id: visits.id, kind: visits.kind, startsAt: visits.startsAt, durationMinutes: visits.durationMinutes, notes: visits.notes })
    .from(visits)
    .where(and(eq(visits.projectId, projectId), isNull(visits.cancelledAt)))
    .orderBy(asc(visits.startsAt));
}

/** The next visit still ahead, per project. */
export async function nextVisits(projectIds: string[], now = new Date()) {
  if (!projectIds.length) return new Map<string, { kind: string; startsAt: Date }>();
  const rows = await db()
    .select({ projectId: visits.projectId, kind: visits.kind, startsAt: visits.startsAt })
    .from(visits)
    .where(and(inArray(visits.projectId, projectIds), isNull(visits.cancelledAt), gte(visits.startsAt, now)))
    .orderBy(asc(visits.startsAt));
  const out = new Map<string, { kind: string; startsAt: Date }>();
  for (const r of rows) if (!out.has(r.projectId)) out.set(r.projectId, { kind: r.kind, startsAt: r.startsAt });
  return out;
}


/**
 * Books a visit. Booking the install day moves the project's target install date to that day, in
 * the same transaction, so the calendar carries one install date, not two.
 */
export async function addVisit(opts: { projectId: string; kind: VisitKind; startsAt: Date; durationMinutes: number; notes: string | null; by: string }) {
  return db().transaction(async (tx) => {
    const [row] = await tx
      .insert(visits)
      .values({ projectId: opts.projectId, kind: opts.kind, startsAt: opts.startsAt, durationMinutes: opts.durationMinutes, notes: opts.notes, createdBy: opts.by })
      .returning();
    if (row.kind === "install day") await tx.update(projects).set({ targetInstallDate: installDateOf(row.startsAt, await companyTimeZone(tx)), updatedAt: new Date() }).where(eq(projects.id, opts.projectId));
    return row;
  });
}

/** Changes a visit that isn't cancelled; moving the install day moves the target install date with it. */
export async function updateVisit(opts: { projectId: string; visitId: string; kind: VisitKind; startsAt: Date; durationMinutes: number; notes: string | null }) {
  return db().transaction(async (tx) => {
    const [row] = await tx
      .update(visits)
      .set({ kind: opts.kind, startsAt: opts.startsAt, durationMinutes: opts.durationMinutes, notes: opts.notes, updatedAt: new Date() })
      .where(and(eq(visits.id, opts.visitId), eq(visits.projectId, opts.projectId), isNull(visits.cancelledAt)))
      .returning();
    if (!row) throw notFound("That visit");
    if (row.kind === "install day") await tx.update(projects).set({ targetInstallDate: installDateOf(row.startsAt, await companyTimeZone(tx)), updatedAt: new Date() }).where(eq(projects.id, opts.projectId));
    return row;
  });
}

/** Cancels a visit with a reason; it stays on record. The target install date is left as it was. */
export async function cancelVisit(opts: { projectId: string; visitId: string; by: string; reason: string }, now = new Date()) {
  const [row] = await db()
    .update(visits)
    .set({ cancelledAt: now, cancelledBy: opts.by, cancelReason: opts.reason })
    .where(and(eq(visits.id, opts.visitId), eq(visits.projectId, opts.projectId), isNull(visits.cancelledAt)))
    .returning();
  if (!row) throw notFound("That visit");
  return row;
}

export type CalendarProject = { id: string; title: string; siteAddress: string; targetInstallDate: string | null };

/** Projects and their visits for a calendar file: one project, or every project the person can see. */
export async function calendarData(opts: { projectId?: string; user: Pick<SessionUser, "id" | "role"> }) {
  const where = opts.projectId ? and(eq(projects.id, opts.projectId), visibleProjectsWhere(opts.user)) : visibleProjectsWhere(opts.user);
  const list: CalendarProject[] = await db()
    .select({ id: projects.id, title: projects.title, siteAddress: projects.siteAddress, targetInstallDate: projects.targetInstallDate })
    .from(projects)
    .where(where);
  const ids = list.map((p) => p.id);
  const rows = ids.length
    ? await db()
        .select({ id: visits.id, projectId: visits.projectId, kind: visits.kind, startsAt: visits.startsAt, durationMinutes: visits.durationMinutes, notes: visits.notes })
        .from(visits)
        .where(and(inArray(visits.projectId, ids), isNull(visits.cancelledAt)))
        .orderBy(asc(visits.startsAt))
    : [];
  return { projects: list, visits: rows };
}

/** The person a calendar-feed token belongs to, or null. */
export async function userByCalendarToken(token: string) {
  const [row] = await db().select({ id: users.id, role: users.role }).from(users).where(eq(users.calendarToken, token)).limit(1);
  return row ?? null;
}

export async function getCalendarToken(userId: string): Promise<string | null> {
  const [row] = await db().select({ token: users.calendarToken }).from(users).where(eq(users.id, userId));
  return row?.token ?? null;
}

/** A new feed secret; the old address stops working at once. */
export async function regenerateCalendarToken(userId: string): Promise<string> {
  const token = randomBytes(24).toString("base64url");
  await db().update(users).set({ calendarToken: token }).where(eq(users.id, userId));
  return token;
}
