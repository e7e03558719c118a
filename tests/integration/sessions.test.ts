import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db";
import { users } from "@/db/schema";
import { makeUser } from "../support/fixtures";
import { Session, anonymous, signedIn } from "../support/http";

const fresh = () => new Session(`2001:db8::${randomUUID().slice(0, 4)}:${randomUUID().slice(0, 4)}`);
const signedInFresh = async (user: { email: string }) => {
  const s = fresh();
  expect(await s.signIn(user.email)).toBe(200);
  return s;
};

describe("sessions", () => {
  it("refuses a copy of the old cookie after sign-out, on the API and on pages", async () => {
    const crew = await makeUser("crew");
    const s = await signedInFresh(crew);
    const stolen = s.copy();
    expect((await stolen.get("/api/me/units")).status).toBe(200);
    expect(await s.signOut()).toBe(200);
    expect((await stolen.get("/api/me/units")).status).toBe(401);
    expect((await stolen.patch("/api/me/units", { unitSystem: "imperial" })).status).toBe(401);
    const page = await stolen.get("/board");
    expect([307, 308]).toContain(page.status);
    expect(page.headers.get("location")).toContain("/sign-in");
    // next-auth's own session read refuses it too.
    expect((await stolen.get("/api/auth/session")).json?.user).toBeUndefined();
    // Signing in again works, with a new session.
    expect((await (await signedInFresh(crew)).get("/api/me/units")).status).toBe(200);
  });

  it("ends every session of a person the lead deactivates, and refuses their sign-in", async () => {
    const [lead, crew] = await Promise.all([makeUser("lead"), makeUser("crew")]);
    const boss = await signedIn(lead);
    const worker = await signedInFresh(crew);
    expect((await worker.get("/api/projects")).status).toBe(200);

    const off = await boss.patch(`/api/people/${crew.id}`, { active: false });
    expect(off.status).toBe(200);
    expect(off.json).toMatchObject({ id: crew.id, active: false });
    expect((await worker.get("/api/projects")).status).toBe(401);
    // Same answer as a wrong password: nothing says the account exists but is off.
    expect(await fresh().signIn(crew.email)).toBe(401);

    const [row] = await db().select({ deactivatedAt: users.deactivatedAt }).from(users).where(eq(users.id, crew.id));
    expect(row.deactivatedAt).not.toBeNull();

    expect((await boss.patch(`/api/people/${crew.id}`, { active: true })).json).toMatchObject({ active: true });
    // The old session stays ended; a new sign-in works.
    expect((await worker.get("/api/projects")).status).toBe(401);
    expect((await (await signedInFresh(crew)).get("/api/projects")).status).toBe(200);
  });

  it("applies a role change on the person's next request", async () => {
    const [lead, crew] = await Promise.all([makeUser("lead"), makeUser("crew")]);
    const boss = await signedIn(lead);
    const worker = await signedInFresh(crew);
    expect((await worker.get("/api/projects")).status).toBe(200);
    expect((await worker.get("/api/people")).status).toBe(403);

    expect((await boss.patch(`/api/people/${crew.id}`, { role: "client" })).json).toMatchObject({ role: "client" });
    expect((await worker.get("/api/projects")).status).toBe(403);
    expect((await worker.get("/api/auth/session")).json.user.role).toBe("client");

    expect((await boss.patch(`/api/people/${crew.id}`, { role: "lead" })).status).toBe(200);
    expect((await worker.get("/api/people")).status).toBe(200);
  });

  it("lets only a lead change access, never their own, and explains bad changes", async () => {
    const [lead, crew, client] = await Promise.all([makeUser("lead"), makeUser("crew"), makeUser("client")]);
    expect((await anonymous().patch(`/api/people/${client.id}`, { active: false })).status).toBe(401);
    expect((await (await signedIn(crew)).patch(`/api/people/${client.id}`, { active: false })).status).toBe(403);
    const boss = await signedIn(lead);
    const self = await boss.patch(`/api/people/${lead.id}`, { role: "crew" });
    expect(self.status).toBe(409);
    expect(self.json.error).toMatch(/can't change your own/);
    const empty = await boss.patch(`/api/people/${client.id}`, {});
    expect(empty.status).toBe(400);
    expect((await boss.patch(`/api/people/${client.id}`, { role: "owner" })).status).toBe(400);
    expect((await boss.patch(`/api/people/${randomUUID()}`, { active: false })).status).toBe(404);
    const [row] = await db().select({ role: users.role, deactivatedAt: users.deactivatedAt }).from(users).where(eq(users.id, client.id));
    expect(row).toEqual({ role: "client", deactivatedAt: null });
  });

  it("sets the session cookie HttpOnly and SameSite, and not Secure over plain HTTP", async () => {
    const crew = await makeUser("crew");
    const res = await fresh().signInResponse(crew.email);
    const cookie = res.headers.getSetCookie().find((c) => c.startsWith("next-auth.session-token="));
    expect(cookie).toBeDefined();
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).not.toMatch(/;\s*Secure/i);
  });
});
