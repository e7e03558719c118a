import "server-only";
import { and, asc, eq, gte, inArray, isNull, lt, or, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { db } from "../index";
import { equipment, projectCrew, projects, users, visits } from "../schema";
import { visibleProjectsWhere } from "./project-access";
import { getServiceSettings } from "./service-settings";
import type { SessionUser } from "../../server/session";
import type { DueItem } from "../../lib/service/due-list";
import { pieceDue } from "../../lib/service/equipment-due";
import { addDays, localDay, zonedInstant, type Ymd } from "../../lib/service/local-dates";

/** Visits a report closes: left undone past their day, they stay on the list as overdue. */
const REPORTED_KINDS = ["service visit", "filter service", "water change"] as const;
/** How far back an undone visit still counts as overdue rather than forgotten history. */
const OVERDUE_LOOKBACK_DAYS = 180;

const assignee = alias(users, "assignee");

/** Where the visit's page is: a service visit's report, or the project's visits. */
const visitHref = (projectId: string, visitId: string, kind: string) => (kind === "service visit" ? `/projects/${projectId}/service/visits/${visitId}` : `/projects/${projectId}/visits`);

/**
 * Everything due in a week (`from`..`to`, in the company's time zone) or overdue, on the projects
 * the person may see: open visits, equipment services falling due, and warranties ending. Four
 * queries, whatever the number of projects. Grouping and the person filter are lib/service/due-list.
 */
export async function loadDueItems(opts: { user: Pick<SessionUser, "id" | "role">; week: { from: Ymd; to: Ymd } }, now = new Date()) {
  const settings = await getServiceSettings();
  const tz = settings.timeZone;
  const today = localDay(now, tz);
  const weekStarts = zonedInstant(opts.week.from, "00:00", tz);
  const weekEnds = zonedInstant(addDays(opts.week.to, 1), "00:00", tz);
  const todayStarts = zonedInstant(today, "00:00", tz);
  const visible = visibleProjectsWhere(opts.user);

  const crewIds = sql<string[]>`array(select pc.user_id::text from ${projectCrew} pc where pc.project_id = ${projects.id})`;
  const [visitRows, pieceRows] = await Promise.all([
    db()
      .select({ id: visits.id, kind: visits.kind, startsAt: visits.startsAt, projectId: projects.id, projectTitle: projects.title, assigneeId: visits.assignedTo, assigneeName: assignee.name, crewIds })
      .from(visits)
      .innerJoin(projects, eq(projects.id, visits.projectId))
      .leftJoin(assignee, eq(assignee.id, visits.assignedTo))
      .where(
        and(
          visible,
          isNull(visits.cancelledAt),
          isNull(visits.completedAt),
          or(
            // A past day's visit is either overdue (below) or done with: the week shows from today on.
            and(gte(visits.startsAt, weekStarts > todayStarts ? weekStarts : todayStarts), lt(visits.startsAt, weekEnds)),
            and(lt(visits.startsAt, todayStarts), gte(visits.startsAt, new Date(todayStarts.getTime() - OVERDUE_LOOKBACK_DAYS * 86_400_000)), inArray(visits.kind, [...REPORTED_KINDS])),
          ),
        ),
      )
      .orderBy(asc(visits.startsAt)),
    db()
      .select({
        id: equipment.id,
        kind: equipment.kind,
        makeModel: equipment.makeModel,
        installedOn: equipment.installedOn,
        warrantyUntil: equipment.warrantyUntil,
        serviceIntervalDays: equipment.serviceIntervalDays,
        lastServicedAt: equipment.lastServicedAt,
        projectId: projects.id,
        projectTitle: projects.title,
        crewIds,
      })
      .from(equipment)
      .innerJoin(projects, eq(projects.id, equipment.projectId))
      .where(and(visible, isNull(equipment.retiredAt))),
  ]);

  const items: DueItem[] = [];
  for (const v of visitRows) {
    items.push({
      key: `visit-${v.id}`,
      type: "visit",
      day: localDay(v.startsAt, tz),
      at: v.startsAt.toISOString(),
      projectId: v.projectId,
      projectTitle: v.projectTitle,
      title: v.kind,
      detail: v.startsAt.toLocaleTimeString("en-GB", { hour: "2-digit", minute: "2-digit", timeZone: tz }),
      href: visitHref(v.projectId, v.id, v.kind),
      assigneeId: v.assigneeId,
      assigneeName: v.assigneeName,
      crewIds: v.crewIds,
    });
  }
  for (const p of pieceRows) {
    const label = p.makeModel ? `${p.kind} (${p.makeModel})` : p.kind;
    const due = pieceDue({ ...p, lastServicedOn: p.lastServicedAt ? localDay(p.lastServicedAt, tz) : null }, settings.equipmentIntervals, today);
    const base = { projectId: p.projectId, projectTitle: p.projectTitle, href: `/projects/${p.projectId}/equipment#piece-${p.id}`, assigneeId: null, assigneeName: null, crewIds: p.crewIds };
    if (due.dueOn && due.dueOn <= opts.week.to) items.push({ ...base, key: `service-${p.id}`, type: "service", day: due.dueOn, title: `Service the ${label}`, detail: due.dueWords });
    if (p.warrantyUntil && p.warrantyUntil >= opts.week.from && p.warrantyUntil <= opts.week.to)
      items.push({ ...base, key: `warranty-${p.id}`, type: "warranty", day: p.warrantyUntil, title: `Warranty ends: ${label}`, detail: "check it over while a fault can still be claimed" });
  }
  return { items, today, timeZone: tz };
}

/** Whom the list can be filtered to: the lead picks anyone on the team; crew see themselves. */
export async function duePeople(user: Pick<SessionUser, "id" | "role" | "name">) {
  if (user.role !== "lead") return [{ id: user.id, name: user.name }];
  return db()
    .select({ id: users.id, name: users.name })
    .from(users)
    .where(and(inArray(users.role, ["lead", "crew"]), isNull(users.deactivatedAt)))
    .orderBy(asc(users.name));
}
