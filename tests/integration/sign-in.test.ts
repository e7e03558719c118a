import { describe, expect, it } from "vitest";
import { makeUser } from "../support/fixtures";
import { TEST_APP_URL, Session, anonymous, signedIn } from "../support/http";

describe("sign-in", () => {
  it("accepts the right password and returns a session naming the role", async () => {
    const crew = await makeUser("crew");
    const s = await signedIn(crew);
    const res = await s.get("/api/auth/session");
    expect(res.status).toBe(200);
    expect(res.json.user).toMatchObject({ email: crew.email, role: "crew", id: crew.id });
  });

  it("matches the e-mail case-insensitively", async () => {
    const client = await makeUser("client");
    const s = new Session();
    expect(await s.signIn(client.email.toUpperCase())).toBe(200);
  });

  it("refuses a wrong password and an unknown e-mail with 401", async () => {
    const lead = await makeUser("lead");
    expect(await new Session().signIn(lead.email, "wrong-password")).toBe(401);
    expect(await new Session().signIn("nobody-here@fixture.test")).toBe(401);
  });

  it("answers malformed and incomplete sign-in bodies with 400 and a message", async () => {
    const bad = await fetch(`${TEST_APP_URL}/api/auth/callback/credentials`, { method: "POST", headers: { "content-type": "application/json" }, body: "{bad" });
    expect(bad.status).toBe(400);
    expect((await bad.json()).error).toMatch(/couldn't be read/);
    const missing = await fetch(`${TEST_APP_URL}/api/auth/callback/credentials`, {
      method: "POST",
      headers: { "content-type": "application/x-www-form-urlencoded" },
      body: "email=not-an-email",
    });
    expect(missing.status).toBe(400);
    expect((await missing.json()).fields).toHaveProperty("password");
  });

  it("sends anonymous API callers a 401 and anonymous page visits to sign-in", async () => {
    const s = anonymous();
    expect((await s.get("/api/people")).status).toBe(401);
    const page = await s.get("/board");
    expect([307, 308]).toContain(page.status);
    expect(page.headers.get("location")).toContain("/sign-in");
  });
});
