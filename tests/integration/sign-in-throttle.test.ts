import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db";
import { users } from "@/db/schema";
import { makeUser, PASSWORD } from "../support/fixtures";
import { Session } from "../support/http";

// The app's defaults (env.ts): 5 wrong sign-ins per account and 30 per address in 15 minutes.
const PER_ACCOUNT = 5;
const PER_ADDRESS = 30;
// A fresh address per caller from 2001:db8::/32, reserved for documentation (RFC 3849).
const address = () => `2001:db8::${randomUUID().slice(0, 4)}:${randomUUID().slice(0, 4)}`;
const caller = () => new Session(address());

// Dozens of real sign-ins, each a scrypt check: generous on a loaded machine (a limit, not a timing).
describe("sign-in throttling", { timeout: 180_000 }, () => {
  it("pauses an account after repeated wrong passwords, from any address, with 429 and Retry-After", async () => {
    const crew = await makeUser("crew");
    for (let i = 0; i < PER_ACCOUNT; i++) expect(await caller().signIn(crew.email, "wrong-password")).toBe(401);
    // Now even the right password, from a fresh address, waits.
    const paused = await caller().signInResponse(crew.email, PASSWORD);
    expect(paused.status).toBe(429);
    const retryAfter = Number(paused.headers.get("retry-after"));
    expect(retryAfter).toBeGreaterThan(0);
    expect(retryAfter).toBeLessThanOrEqual(15 * 60);
    expect(paused.json.error).toMatch(/Too many sign-in attempts.*Wait about \d+ minutes/);
    expect(paused.headers.getSetCookie().some((c) => c.includes("session-token"))).toBe(false);
  });

  it("clears an account's count after a right password", async () => {
    const client = await makeUser("client");
    const s = caller();
    for (let i = 0; i < PER_ACCOUNT - 1; i++) expect(await s.signIn(client.email, "wrong-password")).toBe(401);
    expect(await s.signIn(client.email)).toBe(200);
    for (let i = 0; i < PER_ACCOUNT - 1; i++) expect(await caller().signIn(client.email, "wrong-password")).toBe(401);
    expect(await caller().signIn(client.email)).toBe(200);
  });

  it("pauses an address that guesses across many accounts, without pausing those accounts elsewhere", async () => {
    const people = await Promise.all(Array.from({ length: Math.ceil(PER_ADDRESS / (PER_ACCOUNT - 1)) + 1 }, () => makeUser("client")));
    const guesser = caller();
    let wrong = 0;
    for (const p of people) {
      for (let i = 0; i < PER_ACCOUNT - 1 && wrong < PER_ADDRESS; i++, wrong++) expect(await guesser.signIn(p.email, "wrong-password")).toBe(401);
    }
    const last = people[people.length - 1];
    const paused = await guesser.signInResponse(last.email, PASSWORD);
    expect(paused.status).toBe(429);
    expect(Number(paused.headers.get("retry-after"))).toBeGreaterThan(0);
    // The same account from another address is fine: it was this address that was paused.
    expect(await caller().signIn(last.email)).toBe(200);
  });

  it("answers an unknown e-mail exactly as a known one, wrong password and pause alike", async () => {
    const lead = await makeUser("lead");
    const unknown = `nobody-${randomUUID().slice(0, 8)}@fixture.test`;
    const shape = (r: Awaited<ReturnType<Session["signInResponse"]>>) => ({
      status: r.status,
      retryAfter: r.headers.get("retry-after") !== null,
      body: JSON.stringify(r.json).replaceAll(/\d+/g, "N"),
      cookies: r.headers.getSetCookie().map((c) => c.split("=")[0]).sort(),
    });
    for (let i = 0; i <= PER_ACCOUNT; i++) {
      const known = await caller().signInResponse(lead.email, "wrong-password");
      const stranger = await caller().signInResponse(unknown, "wrong-password");
      expect(shape(stranger)).toEqual(shape(known));
      expect(known.status).toBe(i < PER_ACCOUNT ? 401 : 429);
    }
  });

  it("replaces an old bcrypt hash with a scrypt one on the next right sign-in", async () => {
    const crew = await makeUser("crew");
    // A bcrypt hash of the fixture password at cost 4, as accounts made before scrypt carry.
    const bcrypt = (await import("bcryptjs")).default;
    await db().update(users).set({ passwordHash: await bcrypt.hash(PASSWORD, 4) }).where(eq(users.id, crew.id));
    expect(await caller().signIn(crew.email)).toBe(200);
    const [row] = await db().select({ passwordHash: users.passwordHash }).from(users).where(eq(users.id, crew.id));
    expect(row.passwordHash).toMatch(/^scrypt\$15\$8\$1\$/);
    expect(await caller().signIn(crew.email)).toBe(200);
  });
});
