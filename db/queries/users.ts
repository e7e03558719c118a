import "server-only";
import { createHash, randomBytes } from "node:crypto";
import { and, asc, eq, gt, isNull, sql } from "drizzle-orm";
import { db, type Tx } from "../index";
import { invitations, notices, users } from "../schema";
import { companyName, enqueueNotice } from "./outbox";
import { invitationEmail } from "../../lib/mail/invitation-email";
import { ROLE_LABELS, type Role } from "../../lib/auth/roles";
import { AppError, conflict } from "../../server/errors";
import { env } from "../../env";
import { dummyHash, hashPassword, verifyPassword } from "../../lib/auth/passwords";

const INVITATION_DAYS = 7;

export const hashToken = (token: string) => createHash("sha256").update(token).digest("hex");

export { hashPassword };

/**
 * The account for these credentials, or null. Never says which part was wrong: an unknown e-mail,
 * an account without a password and a deactivated account are checked against a hash of the same
 * cost and answer the same. An old bcrypt hash is replaced by a scrypt one once the password matches.
 */
export async function verifyCredentials(email: string, password: string) {
  const [user] = await db()
    .select()
    .from(users)
    .where(sql`lower(${users.email}) = lower(${email})`)
    .limit(1);
  const verdict = await verifyPassword(password, user?.passwordHash ?? (await dummyHash()));
  if (!verdict.ok || !user?.passwordHash || user.deactivatedAt) return null;
  if (verdict.needsRehash) {
    const passwordHash = await hashPassword(password);
    // Only if the hash is still the one just checked, so a password changed meanwhile wins.
    await db()
      .update(users)
      .set({ passwordHash })
      .where(and(eq(users.id, user.id), eq(users.passwordHash, user.passwordHash)));
  }
  return user;
}

/** Everyone the lead manages, with their latest invitation and whether its e-mail went out. */
export async function listPeople() {
  const rows = await db()
    .select({
      id: users.id,
      name: users.name,
      email: users.email,
      phone: users.phone,
      role: users.role,
      active: sql<boolean>`${users.passwordHash} is not null`,
      deactivated: sql<boolean>`${users.deactivatedAt} is not null`,
      createdAt: users.createdAt,
      invitedAt: sql<Date | null>`(select max(i.created_at) from ${invitations} i where i.user_id = "users"."id")`,
      inviteStatus: sql<string | null>`(select n.status from ${notices} n where n.recipient_id = "users"."id" and n.kind = 'invitation' order by n.created_at desc limit 1)`,
      inviteError: sql<string | null>`(select n.last_error from ${notices} n where n.recipient_id = "users"."id" and n.kind = 'invitation' order by n.created_at desc limit 1)`,
    })
    .from(users)
    .orderBy(asc(users.role), asc(users.name));
  return rows;
}

/**
 * Creates an account with no password and e-mails a single-use link to set one. The account, the
 * invitation and its e-mail are written in one transaction.
 */
export async function inviteUser(input: { name: string; email: string; role: Role; phone?: string | null }, invitedBy: string) {
  return db().transaction((tx) => inviteUserInTx(tx, input, invitedBy));
}

/** inviteUser inside a caller's transaction, for writes that create an account along with other records. */
export async function inviteUserInTx(tx: Tx, input: { name: string; email: string; role: Role; phone?: string | null }, invitedBy: string) {
  const [existing] = await tx
    .select({ id: users.id })
    .from(users)
    .where(sql`lower(${users.email}) = lower(${input.email})`);
  if (existing) throw new AppError(409, "Someone already has an account with that e-mail.", { email: "Someone already has an account with that e-mail." });
  const [user] = await tx
    .insert(users)
    .values({ name: input.name, email: input.email, role: input.role, phone: input.phone ?? null })
    .returning();
  await issueInvitation(tx, user, invitedBy);
  return user;
}

/** A fresh link for someone who hasn't set a password yet; older links stop working. */
export async function resendInvitation(userId: string, invitedBy: string) {
  return db().transaction(async (tx) => {
    const [user] = await tx.select().from(users).where(eq(users.id, userId));
    if (!user) throw new AppError(404, "That person wasn't found.");
    if (user.passwordHash) throw conflict(`${user.name} has already set a password; they can sign in.`);
    await tx.update(invitations).set({ usedAt: new Date() }).where(and(eq(invitations.userId, userId), isNull(invitations.usedAt)));
    await issueInvitation(tx, user, invitedBy);
    return user;
  });
}

async function issueInvitation(
  tx: Parameters<Parameters<ReturnType<typeof db>["transaction"]>[0]>[0],
  user: typeof users.$inferSelect,
  invitedBy: string,
) {
  const token = randomBytes(32).toString("base64url");
  await tx.insert(invitations).values({
    userId: user.id,
    tokenHash: hashToken(token),
    expiresAt: new Date(Date.now() + INVITATION_DAYS * 24 * 3600 * 1000),
    createdBy: invitedBy,
  });
  const url = `${env().APP_URL}/invitation/${token}`;
  const email = invitationEmail({ companyName: await companyName(tx), name: user.name, roleLabel: ROLE_LABELS[user.role], role: user.role, url, expiresInDays: INVITATION_DAYS });
  await enqueueNotice(tx, { kind: "invitation", recipientId: user.id, toEmail: user.email, email });
}

export type InvitationState = { ok: true; name: string; email: string } | { ok: false; status: 400 | 404; message: string };

/** Whether an invitation link can still be used, without using it. */
export async function checkInvitation(token: string): Promise<InvitationState> {
  const [row] = await db()
    .select({ usedAt: invitations.usedAt, expiresAt: invitations.expiresAt, name: users.name, email: users.email })
    .from(invitations)
    .innerJoin(users, eq(users.id, invitations.userId))
    .where(eq(invitations.tokenHash, hashToken(token)));
  if (!row) return { ok: false, status: 404, message: "This invitation link isn't valid. Ask your project lead for a new one." };
  if (row.usedAt) return { ok: false, status: 400, message: "This invitation link has already been used. Sign in, or ask your project lead for a new link." };
  if (row.expiresAt < new Date()) return { ok: false, status: 400, message: "This invitation link has expired. Ask your project lead to send a new one." };
  return { ok: true, name: row.name, email: row.email };
}

/** Sets the password and spends the invitation, atomically: a link works exactly once. */
export async function acceptInvitation(token: string, password: string) {
  const passwordHash = await hashPassword(password);
  return db().transaction(async (tx) => {
    const [inv] = await tx
      .update(invitations)
      .set({ usedAt: new Date() })
      .where(and(eq(invitations.tokenHash, hashToken(token)), isNull(invitations.usedAt), gt(invitations.expiresAt, new Date())))
      .returning({ userId: invitations.userId });
    if (!inv) {
      const state = await checkInvitation(token);
      throw new AppError(state.ok ? 409 : state.status, state.ok ? "This invitation link can't be used now." : state.message);
    }
    const [user] = await tx.update(users).set({ passwordHash }).where(eq(users.id, inv.userId)).returning({ email: users.email, role: users.role });
    return user;
  });
}


/** A person's name and e-mail, or null. */
export async function getUserContact(userId: string): Promise<{ name: string; email: string } | null> {
  const [row] = await db().select({ name: users.name, email: users.email }).from(users).where(eq(users.id, userId));
  return row ?? null;
}
