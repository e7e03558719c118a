import "server-only";
import { asc, eq } from "drizzle-orm";
import { db } from "../index";
import { projects, users } from "../schema";
import { visibleProjectsWhere } from "./project-access";
import type { SessionUser } from "../../server/session";

/** The caller's projects with their client's name, in board order. */
export async function listVisibleProjects(user: Pick<SessionUser, "id" | "role">) {
  return db()
    .select({
      id: projects.id,
      title: projects.title,
      stage: projects.stage,
      siteTown: projects.siteTown,
      siteAddress: projects.siteAddress,
      targetInstallDate: projects.targetInstallDate,
      targetHandoverDate: projects.targetHandoverDate,
      tankSummary: projects.tankSummary,
      stageEnteredAt: projects.stageEnteredAt,
      clientName: users.name,
    })
    .from(projects)
    .innerJoin(users, eq(users.id, projects.clientId))
    .where(visibleProjectsWhere(user))
    .orderBy(asc(projects.stage), asc(projects.position));
}
