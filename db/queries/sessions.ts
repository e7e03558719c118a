import "server-only";
import { and, eq, sql } from "drizzle-orm";
import { db } from "../index";
import { users } from "../schema";
import type { Role } from "../../lib/auth/roles";

export type AccountState = { id: string; name: string; email: string; role: Role; sessionVersion: number; active: boolean };

/** What each request needs to know about the signed-in person: current role, session version, active. */
export async function getAccountState(userId: string): Promise<AccountState | null> {
  const [row] = await db()
    .select({ id: users.id, name: users.name, email: users.email, role: users.role, sessionVersion: users.sessionVersion, deactivatedAt: users.deactivatedAt })
    .from(users)
    .where(eq(users.id, userId));
  if (!row) return null;
  const { deactivatedAt, ...rest } = row;
  return { ...rest, active: deactivatedAt === null };
}

/** Ends every session the person has: tokens issued under the current version stop working. */
export async function endSessions(userId: string, fromVersion: number): Promise<void> {
  await db()
    .update(users)
    .set({ sessionVersion: sql`${users.sessionVersion} + 1` })
    .where(and(eq(users.id, userId), eq(users.sessionVersion, fromVersion)));
}

export type AccessChange = { role?: Role; active?: boolean };

/**
 * The lead's change to someone's access. Deactivating also raises the session version, so the
 * person's sessions stay ended even if they are reactivated later. Returns null for an unknown id.
 */
export async function setPersonAccess(userId: string, change: AccessChange) {
  const [row] = await db()
    .update(users)
    .set({
      ...(change.role ? { role: change.role } : {}),
      ...(change.active === false ? { deactivatedAt: new Date(), sessionVersion: sql`${users.sessionVersion} + 1` } : {}),
      ...(change.active === true ? { deactivatedAt: null } : {}),
    })
    .where(eq(users.id, userId))
    .returning({ id: users.id, name: users.name, role: users.role, deactivatedAt: users.deactivatedAt });
  return row ? { id: row.id, name: row.name, role: row.role, active: row.deactivatedAt === null } : null;
}
