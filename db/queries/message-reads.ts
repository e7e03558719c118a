import "server-only";
import { sql } from "drizzle-orm";
import { db } from "../index";
import { messageReads } from "../schema";
import { visibleProjectsWhere } from "./project-access";
import type { SessionUser } from "../../server/session";

/** Marks a project's messages read by this person up to now (the talk page calls it when they look). */
export async function markMessagesRead(userId: string, projectId: string, now = new Date()) {
  await db()
    .insert(messageReads)
    .values({ userId, projectId, readAt: now })
    .onConflictDoUpdate({ target: [messageReads.userId, messageReads.projectId], set: { readAt: now } });
}

/** Client messages the person hasn't read, over every project they can see. */
export async function unreadClientMessages(user: Pick<SessionUser, "id" | "role">): Promise<number> {
  const visible = visibleProjectsWhere(user);
  const { rows } = await db().execute<{ n: number }>(sql`
    select count(*)::int as n from messages m join projects on projects.id = m.project_id
    left join message_reads mr on mr.project_id = m.project_id and mr.user_id = ${user.id}
    where ${visible} and m.author_id = projects.client_id and m.created_at > coalesce(mr.read_at, '-infinity'::timestamptz)`);
  return rows[0]?.n ?? 0;
}
