import "server-only";
import { cookies } from "next/headers";
import { redirect, notFound as nextNotFound } from "next/navigation";
import { forbidden, unauthorized } from "./errors";
import { readSessionToken, sessionCookieValue } from "./session-token";
import { accountState } from "./account-cache";
import type { Role } from "../lib/auth/roles";

export type SessionUser = { id: string; role: Role; name: string; email: string };

/**
 * The signed-in person, or null. Decodes the session cookie (no session rebuild), then checks the
 * person's current record (cached a few seconds per instance): a deactivated person, or a token
 * from before their last sign-out, is nobody. Role, name and e-mail come from the record, so a
 * role change applies from the next request.
 */
export async function getSessionUser(): Promise<SessionUser | null> {
  const claims = await readSessionToken(sessionCookieValue(await cookies()));
  if (!claims) return null;
  const account = await accountState(claims.uid);
  if (!account || !account.active || account.sessionVersion !== claims.sv) return null;
  return { id: account.id, role: account.role, name: account.name, email: account.email };
}

/** For route handlers and actions: 401 without a session, 403 for a role not in `roles`. */
export async function requireUser(...roles: Role[]): Promise<SessionUser> {
  const user = await getSessionUser();
  if (!user) throw unauthorized();
  if (roles.length && !roles.includes(user.role)) throw forbidden("Your role doesn't have access to this.");
  return user;
}

/** For pages: the sign-in page without a session, the not-found page for a role not in `roles`. */
export async function requirePageUser(...roles: Role[]): Promise<SessionUser> {
  const user = await getSessionUser();
  if (!user) redirect("/sign-in");
  if (roles.length && !roles.includes(user.role)) nextNotFound();
  return user;
}
