import "server-only";
import { and, desc, eq, ilike, or, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { db } from "../index";
import { projects, users } from "../schema";
import { visibleProjectsWhere } from "./project-access";
import type { SessionUser } from "../../server/session";

export type InServiceTank = { id: string; title: string; clientName: string; siteTown: string; handedOverAt: string };
export type InServicePage = { tanks: InServiceTank[]; total: number; page: number; pageCount: number; pageSize: number };

/** `%` and `_` typed by a person are searched for as themselves. */
const likeEscape = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

/**
 * The tanks in service the user may see, newest handover first, `pageSize` at a time, optionally
 * matching `q` in the title, the client's name or the town. Two queries: the page and the count.
 */
export async function listInService({ user, q, page, pageSize }: { user: Pick<SessionUser, "id" | "role">; q: string | null; page: number; pageSize: number }): Promise<InServicePage> {
  const client = alias(users, "client");
  const pattern = q ? `%${likeEscape(q)}%` : null;
  const where = and(
    visibleProjectsWhere(user),
    eq(projects.stage, "in_service"),
    pattern ? or(ilike(projects.title, pattern), ilike(client.name, pattern), ilike(projects.siteTown, pattern)) : undefined,
  );
  const [rows, [{ total }]] = await Promise.all([
    db()
      .select({ id: projects.id, title: projects.title, clientName: client.name, siteTown: projects.siteTown, handedOverAt: projects.stageEnteredAt })
      .from(projects)
      .innerJoin(client, eq(client.id, projects.clientId))
      .where(where)
      .orderBy(desc(projects.stageEnteredAt), projects.id)
      .limit(pageSize)
      .offset((page - 1) * pageSize),
    db()
      .select({ total: sql<number>`count(*)::int` })
      .from(projects)
      .innerJoin(client, eq(client.id, projects.clientId))
      .where(where),
  ]);
  return {
    tanks: rows.map((r) => ({ ...r, handedOverAt: r.handedOverAt.toISOString() })),
    total,
    page,
    pageSize,
    pageCount: Math.max(1, Math.ceil(total / pageSize)),
  };
}
