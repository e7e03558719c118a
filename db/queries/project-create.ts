import "server-only";
import { and, asc, eq, gt, inArray, isNull, sql } from "drizzle-orm";
import { db, type Tx } from "../index";
import { projectCrew, projects, stageEvents, users, visits } from "../schema";
import { inviteUserInTx } from "./users";
import { keyBetween } from "../../lib/stages/ordering";
import { badRequest, conflict, notFound, unprocessable } from "../../server/errors";
import { shiftInstallVisits } from "../../lib/install/install-day-dates";
import { companyTimeZone } from "./service-plans";
import { COLUMN_LOCK_SPACE, STALE_MESSAGE } from "./project-move";
import type { Role } from "../../lib/auth/roles";

type NewProject = {
  clientMode: "existing" | "new";
  clientId: string;
  clientName: string;
  clientEmail: string;
  title: string;
  siteAddress: string;
  siteTown: string;
  targetInstallDate: string;
  leadId: string;
  crewIds: string[];
  tankSummary: string;
};

async function requireRoles(tx: Tx, ids: string[], role: Role, field: string, message: string) {
  if (!ids.length) return;
  const found = await tx.select({ id: users.id }).from(users).where(and(inArray(users.id, ids), eq(users.role, role)));
  if (found.length !== new Set(ids).size) throw badRequest(message, { [field]: message });
}

/**
 * Creates a project at the end of the site-survey column with a "Project created" event; a new
 * client gets an account and an invitation e-mail in the same transaction.
 */
export async function createProject(input: NewProject, byUserId: string) {
  return db().transaction(async (tx) => {
    let clientId = input.clientId;
    if (input.clientMode === "new") {
      const client = await inviteUserInTx(tx, { name: input.clientName, email: input.clientEmail, role: "client" }, byUserId);
      clientId = client.id;
    } else {
      await requireRoles(tx, [clientId], "client", "clientId", "Choose a client from the list.");
    }
    const crewIds = [...new Set(input.crewIds)];
    await requireRoles(tx, input.leadId ? [input.leadId] : [], "lead", "leadId", "Choose a lead from the list.");
    await requireRoles(tx, crewIds, "crew", "crewIds", "Choose crew from the list.");
    // The same column lock the board's moves take, so a new card's key never collides with a drop.
    await tx.execute(sql`select pg_advisory_xact_lock(${COLUMN_LOCK_SPACE}, 0)`);
    const [last] = await tx
      .select({ position: projects.position })
      .from(projects)
      .where(eq(projects.stage, "site_survey"))
      .orderBy(sql`${projects.position} collate "C" desc`)
      .limit(1);
    const [project] = await tx
      .insert(projects)
      .values({
        title: input.title,
        clientId,
        leadId: input.leadId || null,
        siteAddress: input.siteAddress,
        siteTown: input.siteTown,
        stage: "site_survey",
        position: keyBetween(last?.position ?? null, null),
        targetInstallDate: input.targetInstallDate || null,
        tankSummary: input.tankSummary || null,
      })
      .returning();
    if (crewIds.length) await tx.insert(projectCrew).values(crewIds.map((userId) => ({ projectId: project.id, userId })));
    await tx.insert(stageEvents).values({ projectId: project.id, fromStage: null, toStage: "site_survey", byUserId, reason: "Project created" });
    return project;
  });
}

export async function getProjectDetail(projectId: string) {
  const [project] = await db().select().from(projects).where(eq(projects.id, projectId));
  if (!project) throw notFound();
  const crew = await db()
    .select({ id: users.id, name: users.name })
    .from(projectCrew)
    .innerJoin(users, eq(users.id, projectCrew.userId))
    .where(eq(projectCrew.projectId, projectId))
    .orderBy(asc(users.name));
  return { ...project, crew };
}

type DetailsChange = {
  version: number;
  title?: string;
  siteAddress?: string;
  siteTown?: string;
  targetInstallDate?: string;
  targetHandoverDate?: string;
  tankSummary?: string;
  crewIds?: string[];
};

/**
 * Changes a project's details under its version; crew, when sent, replace the assignment list. A new
 * target install date moves the install-day visits still ahead with it; clearing the date while one
 * is booked is refused (the visit is the plan: it is moved or cancelled on the Visits page).
 */
export async function updateProjectDetails(projectId: string, change: DetailsChange, now = new Date()) {
  return db().transaction(async (tx) => {
    const [project] = await tx.select().from(projects).where(eq(projects.id, projectId)).for("update");
    if (!project) throw notFound();
    if (project.version !== change.version) throw conflict(STALE_MESSAGE, { currentVersion: project.version });
    const set: Partial<typeof projects.$inferInsert> = { version: project.version + 1, updatedAt: new Date() };
    if (change.title !== undefined) set.title = change.title;
    if (change.siteAddress !== undefined) set.siteAddress = change.siteAddress;
    if (change.siteTown !== undefined) set.siteTown = change.siteTown;
    let movedInstallVisits = 0;
    if (change.targetInstallDate !== undefined) {
      const target = change.targetInstallDate || null;
      set.targetInstallDate = target;
      if (target !== project.targetInstallDate) movedInstallVisits = await moveBookedInstallDays(tx, projectId, target, now);
    }
    if (change.targetHandoverDate !== undefined) set.targetHandoverDate = change.targetHandoverDate || null;
    if (change.tankSummary !== undefined) set.tankSummary = change.tankSummary || null;
    if (change.crewIds) {
      const crewIds = [...new Set(change.crewIds)];
      await requireRoles(tx, crewIds, "crew", "crewIds", "Choose crew from the list.");
      // An assignment is a link, not something a person wrote: replacing the list is the change itself.
      await tx.delete(projectCrew).where(eq(projectCrew.projectId, projectId));
      if (crewIds.length) await tx.insert(projectCrew).values(crewIds.map((userId) => ({ projectId, userId })));
    }
    const [updated] = await tx.update(projects).set(set).where(eq(projects.id, projectId)).returning();
    return { ...updated, movedInstallVisits };
  });
}

/** Moves the install-day visits still ahead so the first falls on `target`; answers how many moved. */
async function moveBookedInstallDays(tx: Tx, projectId: string, target: string | null, now: Date): Promise<number> {
  const booked = await tx
    .select({ id: visits.id, startsAt: visits.startsAt })
    .from(visits)
    .where(and(eq(visits.projectId, projectId), eq(visits.kind, "install day"), isNull(visits.cancelledAt), isNull(visits.completedAt), gt(visits.startsAt, now)));
  if (!booked.length) return 0;
  if (!target) {
    throw unprocessable("An install day is booked for this project. Move or cancel it on the Visits page, or give a new target date instead of clearing it.");
  }
  const moved = shiftInstallVisits(booked, target, await companyTimeZone(tx));
  for (const m of moved) await tx.update(visits).set({ startsAt: m.startsAt, updatedAt: now }).where(eq(visits.id, m.id));
  return moved.length;
}

/** The people the new-project form offers. */
export async function listProjectFormPeople() {
  const rows = await db().select({ id: users.id, name: users.name, email: users.email, role: users.role }).from(users).orderBy(asc(users.name));
  return {
    clients: rows.filter((r) => r.role === "client"),
    leads: rows.filter((r) => r.role === "lead"),
    crew: rows.filter((r) => r.role === "crew"),
  };
}
