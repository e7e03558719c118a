import { describe, expect, it } from "vitest";
import { makeTeam } from "../support/fixtures";
import { signedIn } from "../support/http";

describe("roles on pages", () => {
  it("shows a project to its lead, assigned crew and owner, and 404s everyone else", async () => {
    const t = await makeTeam();
    for (const who of [t.lead, t.crew, t.client]) {
      const res = await (await signedIn(who)).get(`/projects/${t.project.id}`);
      expect(res.status, who.role).toBe(200);
      expect(res.text).toContain(t.project.title);
    }
    for (const who of [t.otherCrew, t.otherClient]) {
      const res = await (await signedIn(who)).get(`/projects/${t.project.id}`);
      expect(res.status, who.role).toBe(404);
      expect(res.text).not.toContain(t.project.title);
    }
  });

  it("keeps lead-only pages from crew and clients", async () => {
    const t = await makeTeam();
    for (const who of [t.crew, t.client]) {
      const s = await signedIn(who);
      expect((await s.get("/people")).status).toBe(404);
      expect((await s.get("/outbox")).status).toBe(404);
      expect((await s.get("/api/people")).status).toBe(403);
    }
    expect((await (await signedIn(t.client)).get("/board")).status).toBe(404);
    expect((await (await signedIn(t.lead)).get("/people")).status).toBe(200);
  });

  it("treats a malformed project id as not found", async () => {
    const t = await makeTeam();
    expect((await (await signedIn(t.lead)).get("/projects/not-a-uuid")).status).toBe(404);
  });
});
