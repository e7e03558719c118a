import "server-only";
import { asc, eq, inArray } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { db } from "../index";
import { projectCrew, stageEvents, users } from "../schema";
import type { ProjectRow } from "./project-access";

/** The people on a project (lead, crew, client), with contact details. */
export async function getProjectPeople(project: ProjectRow) {
  const crew = await db()
    .select({ id: users.id, name: users.name, email: users.email, phone: users.phone })
    .from(projectCrew)
    .innerJoin(users, eq(users.id, projectCrew.userId))
    .where(eq(projectCrew.projectId, project.id))
    .orderBy(asc(users.name));
  const ids = [project.clientId, project.leadId].filter((x): x is string => !!x);
  const others = ids.length ? await db().select({ id: users.id, name: users.name, email: users.email, phone: users.phone }).from(users).where(inArray(users.id, ids)) : [];
  return {
    client: others.find((u) => u.id === project.clientId) ?? null,
    lead: others.find((u) => u.id === project.leadId) ?? null,
    crew,
  };
}

/** Every stage change of a project, oldest first, with who made it. */
export async function getStageTimeline(projectId: string) {
  const by = alias(users, "by");
  return db()
    .select({
      id: stageEvents.id,
      at: stageEvents.at,
      fromStage: stageEvents.fromStage,
      toStage: stageEvents.toStage,
      reason: stageEvents.reason,
      override: stageEvents.override,
      gateReasons: stageEvents.gateReasons,
      cycleRestarted: stageEvents.cycleRestarted,
      byName: by.name,
      byRole: by.role,
    })
    .from(stageEvents)
    .innerJoin(by, eq(by.id, stageEvents.byUserId))
    .where(eq(stageEvents.projectId, projectId))
    .orderBy(asc(stageEvents.at));
}
