import { randomUUID } from "node:crypto";
import { describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { invitations, users } from "@/db/schema";
import { makeUser } from "../support/fixtures";
import { Session, anonymous, signedIn } from "../support/http";
import { setSmtp, waitForMail } from "../support/mail";

const linkIn = (text: string) => text.match(/\/invitation\/([A-Za-z0-9_-]+)/)![1];

describe("invitations", () => {
  it("e-mails a single-use link that sets the password", async () => {
    const lead = await signedIn(await makeUser("lead"));
    const email = `new-client-${randomUUID().slice(0, 8)}@fixture.test`;
    const created = await lead.post("/api/people", { name: "Nell Fixture", email, role: "client" });
    expect(created.status).toBe(201);

    const [mail] = await waitForMail(email);
    expect(mail.subject).toMatch(/invited you to Tankwright/);
    const token = linkIn(mail.text);

    const page = await anonymous().get(`/invitation/${token}`);
    expect(page.status).toBe(200);
    expect(page.text).toContain("Nell Fixture");

    const accept = await anonymous().post("/api/invitations/accept", { token, password: "a-good-long-password", confirm: "a-good-long-password" });
    expect(accept.status).toBe(200);
    expect(await new Session().signIn(email, "a-good-long-password")).toBe(200);

    const reuse = await anonymous().post("/api/invitations/accept", { token, password: "another-long-password", confirm: "another-long-password" });
    expect(reuse.status).toBe(400);
    expect(reuse.json.error).toMatch(/already been used/);
    expect(await new Session().signIn(email, "another-long-password")).toBe(401);
  });

  it("refuses an expired link, an unknown link, and a mismatched password without changing anything", async () => {
    const lead = await signedIn(await makeUser("lead"));
    const email = `new-crew-${randomUUID().slice(0, 8)}@fixture.test`;
    const created = await lead.post("/api/people", { name: "Ossian Fixture", email, role: "crew" });
    const token = linkIn((await waitForMail(email))[0].text);

    const mismatch = await anonymous().post("/api/invitations/accept", { token, password: "a-good-long-password", confirm: "different-password" });
    expect(mismatch.status).toBe(400);
    expect(mismatch.json.fields.confirm).toMatch(/don't match/);

    await db().update(invitations).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(invitations.userId, created.json.id));
    const expired = await anonymous().post("/api/invitations/accept", { token, password: "a-good-long-password", confirm: "a-good-long-password" });
    expect(expired.status).toBe(400);
    expect(expired.json.error).toMatch(/expired/);

    const unknown = await anonymous().post("/api/invitations/accept", { token: "x".repeat(40), password: "a-good-long-password", confirm: "a-good-long-password" });
    expect(unknown.status).toBe(404);

    const [user] = await db().select().from(users).where(eq(users.id, created.json.id));
    expect(user.passwordHash).toBeNull();
  });

  it("rejects duplicate e-mails, bad fields and non-leads", async () => {
    const leadUser = await makeUser("lead");
    const lead = await signedIn(leadUser);
    const dup = await lead.post("/api/people", { name: "Dup", email: leadUser.email.toUpperCase(), role: "crew" });
    expect(dup.status).toBe(409);
    const bad = await lead.post("/api/people", { name: "", email: "nope", role: "lead" });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.json.fields)).toEqual(expect.arrayContaining(["name", "email", "role"]));
    const crew = await signedIn(await makeUser("crew"));
    expect((await crew.post("/api/people", { name: "X Y", email: "xy@fixture.test", role: "client" })).status).toBe(403);
  });

  it("keeps the invitation when the mail server is down, and lets the lead resend", async () => {
    const lead = await signedIn(await makeUser("lead"));
    const email = `outage-${randomUUID().slice(0, 8)}@fixture.test`;
    await setSmtp(false);
    let created;
    try {
      created = await lead.post("/api/people", { name: "Outage Fixture", email, role: "client" });
      expect(created.status).toBe(201);
      await new Promise((r) => setTimeout(r, 1500));
      const people = await lead.get("/api/people");
      const row = people.json.people.find((p: { email: string }) => p.email === email);
      expect(row.inviteStatus).toBe("waiting");
    } finally {
      await setSmtp(true);
    }
    const resend = await lead.post(`/api/people/${created.json.id}/invitation`);
    expect(resend.status).toBe(200);
    // Both e-mails arrive once SMTP is back: the first after its retry, the second at once.
    const mails = await waitForMail(email, 2, 40_000);
    const statuses = [];
    for (const m of mails) {
      const res = await anonymous().post("/api/invitations/accept", { token: linkIn(m.text), password: "a-good-long-password", confirm: "a-good-long-password" });
      statuses.push(res.status);
    }
    // Only the newest link works; the resend withdrew the first.
    expect(statuses.sort()).toEqual([200, 400]);
  });
});
