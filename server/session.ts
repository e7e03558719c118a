import "server-only";
import { getServerSession } from "next-auth";
import { redirect, notFound as nextNotFound } from "next/navigation";
import { authOptions } from "./auth-options";
import { forbidden, unauthorized } from "./errors";
import type { Role } from "../lib/auth/roles";

export type SessionUser = { id: string; role: Role; name: string; email: string };

/** The signed-in person, from the signed session token, or null. */
export async function getSessionUser(): Promise<SessionUser | null> {
  const session = await getServerSession(authOptions);
  const u = session?.user;
  if (!u?.id || !u.role) return null;
  return { id: u.id, role: u.role, name: u.name ?? "", email: u.email ?? "" };
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
