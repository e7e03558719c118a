import "server-only";
import { eq, sql } from "drizzle-orm";
import { db } from "../index";
import { projectCrew, projects } from "../schema";
import { canOnProject, canSeeProject, type ProjectAction, type Relation } from "../../lib/auth/permissions";
import { forbidden, notFound } from "../../server/errors";
import { parseId } from "../../server/ids";
import type { SessionUser } from "../../server/session";

export type ProjectRow = typeof projects.$inferSelect;

/** SQL condition: the projects this user may see. Used in every list query's `where`. */
export function visibleProjectsWhere(user: Pick<SessionUser, "id" | "role">) {
  if (user.role === "lead") return sql`true`;
  if (user.role === "crew") {
    return sql`exists (select 1 from ${projectCrew} pc where pc.project_id = ${projects.id} and pc.user_id = ${user.id})`;
  }
  return eq(projects.clientId, user.id);
}

/** The project and the caller's relation to it, or null when it doesn't exist. */
export async function loadProjectRelation(projectId: string, user: Pick<SessionUser, "id" | "role">) {
  const [row] = await db()
    .select({
      project: projects,
      assigned: sql<boolean>`exists (select 1 from ${projectCrew} pc where pc.project_id = ${projects.id} and pc.user_id = ${user.id})`,
    })
    .from(projects)
    .where(eq(projects.id, projectId))
    .limit(1);
  if (!row) return null;
  const relation: Relation = { role: user.role, assigned: row.assigned, owner: row.project.clientId === user.id };
  return { project: row.project, relation };
}

/**
 * The one gate every project route, action and page goes through: 404 when the caller can't see
 * the project (its existence isn't revealed), 403 when they can see it but not do `action`.
 */
export async function requireProject(opts: { projectId: string; user: Pick<SessionUser, "id" | "role">; action: ProjectAction }) {
  const id = parseId(opts.projectId);
  const found = await loadProjectRelation(id, opts.user);
  if (!found || !canSeeProject(found.relation)) throw notFound();
  if (!canOnProject(found.relation, opts.action)) throw forbidden();
  return found;
}
