import "server-only";
import { eq, sql } from "drizzle-orm";
import { db } from "../index";
import { notificationPrefs, noticeKinds, users } from "../schema";

export type PrefKind = (typeof noticeKinds)[number];

/** Every kind with its setting; a kind never set is on. */
export async function getPrefs(userId: string): Promise<Record<PrefKind, boolean>> {
  const rows = await db().select().from(notificationPrefs).where(eq(notificationPrefs.userId, userId));
  const out = Object.fromEntries(noticeKinds.map((k) => [k, true])) as Record<PrefKind, boolean>;
  for (const r of rows) out[r.kind] = r.enabled;
  return out;
}

export async function setPrefs(userId: string, prefs: Partial<Record<PrefKind, boolean>>) {
  const values = Object.entries(prefs)
    .filter((e): e is [PrefKind, boolean] => typeof e[1] === "boolean")
    .map(([kind, enabled]) => ({ userId, kind, enabled }));
  if (!values.length) return;
  await db()
    .insert(notificationPrefs)
    .values(values)
    .onConflictDoUpdate({ target: [notificationPrefs.userId, notificationPrefs.kind], set: { enabled: sql`excluded.enabled` } });
}

export async function getContact(userId: string) {
  const [row] = await db().select({ name: users.name, email: users.email, phone: users.phone }).from(users).where(eq(users.id, userId));
  return row ?? null;
}

export async function setContact(userId: string, contact: { name: string; phone: string | null }) {
  await db().update(users).set({ name: contact.name, phone: contact.phone }).where(eq(users.id, userId));
}
