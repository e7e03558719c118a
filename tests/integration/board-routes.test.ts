import { describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { notices, projectCrew, stageEvents, users } from "@/db/schema";
import { getProject, makeProject, makeTeam, makeUser } from "../support/fixtures";
import { anonymous, signedIn } from "../support/http";
import { completeSurvey } from "./board-support";

describe("who may use the board's routes", () => {
  it("refuses clients on every board route, and hides other clients' projects", async () => {
    const t = await makeTeam();
    const s = await signedIn(t.client);
    const own = t.project.id;
    expect((await s.get("/api/projects")).status).toBe(403);
    expect((await s.post("/api/projects", {})).status).toBe(403);
    expect((await s.get(`/api/projects/${own}`)).status).toBe(403);
    expect((await s.patch(`/api/projects/${own}`, { version: 1, title: "Mine now" })).status).toBe(403);
    expect((await s.post(`/api/projects/${own}/move`, { toStage: "aquascape", version: 1 })).status).toBe(403);
    const other = await signedIn(t.otherClient);
    expect((await other.get(`/api/projects/${own}`)).status).toBe(404);
    expect((await other.patch(`/api/projects/${own}`, { version: 1, title: "Mine now" })).status).toBe(404);
    expect((await other.post(`/api/projects/${own}/move`, { toStage: "aquascape", version: 1 })).status).toBe(404);
    expect((await anonymous().get("/api/projects")).status).toBe(401);
    expect((await getProject(own)).title).toBe(t.project.title);
  });

  it("shows crew only their projects and lets them move only those", async () => {
    const t = await makeTeam();
    const crewBoard = await (await signedIn(t.crew)).get("/api/projects");
    expect(crewBoard.status).toBe(200);
    expect(crewBoard.json.cards.map((c: { id: string }) => c.id)).toContain(t.project.id);
    expect(crewBoard.json.cards.every((c: { crew: { id: string }[] }) => c.crew.some((p) => p.id === t.crew.id))).toBe(true);
    const other = await signedIn(t.otherCrew);
    const otherBoard = await other.get("/api/projects");
    expect(otherBoard.json.cards.map((c: { id: string }) => c.id)).not.toContain(t.project.id);
    expect((await other.post(`/api/projects/${t.project.id}/move`, { toStage: "site_survey", version: 1 })).status).toBe(404);
    expect((await other.get(`/api/projects/${t.project.id}`)).status).toBe(404);
  });

  it("gives each card what its next stage needs", async () => {
    const t = await makeTeam();
    const t2 = await makeProject({ client: t.client, lead: t.lead, crew: [t.crew] });
    await completeSurvey(t2, t.crew);
    const board = await (await signedIn(t.lead)).get("/api/projects");
    const card = board.json.cards.find((c: { id: string }) => c.id === t.project.id);
    const ready = board.json.cards.find((c: { id: string }) => c.id === t2.id);
    expect(card).toMatchObject({ stage: "site_survey", siteTown: "Testbury", clientName: t.client.name, leadName: t.lead.name });
    expect(card.nextNeeds[0]).toContain("site survey");
    expect(ready.nextNeeds).toEqual([]);
  });
});

describe("bad input", () => {
  it("answers 400 or 404 with a message, never 500, and changes nothing", async () => {
    const t = await makeTeam();
    const s = await signedIn(t.lead);
    const id = t.project.id;
    const cases: [unknown, number][] = [
      [{ toStage: "moon", version: 1 }, 400],
      [{ toStage: "aquascape" }, 400],
      [{ toStage: "aquascape", version: "one" }, 400],
      [{ toStage: "site_survey", version: 1, beforeId: "not-an-id" }, 400],
      [{ toStage: "site_survey", version: 1, beforeId: id }, 400],
      [{ toStage: "site_survey", version: 1, position: -1 }, 400],
      [{ toStage: "site_survey", version: 1, position: 0, afterId: id }, 400],
      ["not json", 400],
    ];
    for (const [body, status] of cases) {
      const res = await s.request("POST", `/api/projects/${id}/move`, body, { headers: { "content-type": "application/json" } });
      expect(res.status, JSON.stringify(body)).toBe(status);
      expect(typeof res.json.error).toBe("string");
    }
    expect((await s.post(`/api/projects/not-a-uuid/move`, { toStage: "aquascape", version: 1 })).status).toBe(404);
    expect((await s.post(`/api/projects/00000000-0000-4000-8000-000000000000/move`, { toStage: "aquascape", version: 1 })).status).toBe(404);
    expect((await s.get(`/api/projects/00000000-0000-4000-8000-000000000000`)).status).toBe(404);
    expect((await s.patch(`/api/projects/${id}`, { title: "No version" })).status).toBe(400);
    expect((await s.post("/api/projects", { clientMode: "existing", clientId: "nope" })).status).toBe(400);
    const after = await getProject(id);
    expect(after.version).toBe(t.project.version);
    expect(after.position).toBe(t.project.position);
  });

  it("answers 409 on a stale version and leaves the card alone", async () => {
    const t = await makeTeam();
    await completeSurvey(t.project, t.lead);
    const s = await signedIn(t.lead);
    const res = await s.post(`/api/projects/${t.project.id}/move`, { toStage: "stand_load_check", version: t.project.version + 5 });
    expect(res.status).toBe(409);
    expect(res.json.error).toBe("Someone else moved or changed this card; the board has been refreshed.");
    expect((await getProject(t.project.id)).stage).toBe("site_survey");
    const patch = await s.patch(`/api/projects/${t.project.id}`, { version: t.project.version + 5, title: "Late edit" });
    expect(patch.status).toBe(409);
  });
});

describe("creating and editing projects", () => {
  it("lets the lead create a project for a new client, who is invited in the same step", async () => {
    const lead = await makeUser("lead");
    const crew = await makeUser("crew");
    const s = await signedIn(lead);
    const email = `new-client-${Date.now()}@fixture.test`;
    const res = await s.post("/api/projects", {
      clientMode: "new", clientId: "", clientName: "Invented Client", clientEmail: email,
      title: "Created conservatory tank", siteAddress: "9 Invented Way", siteTown: "Nowhere Green",
      targetInstallDate: "2027-03-01", leadId: lead.id, crewIds: [crew.id], tankSummary: "1000 × 400 × 500 mm",
    });
    expect(res.status, JSON.stringify(res.json)).toBe(201);
    const p = await getProject(res.json.id);
    expect(p).toMatchObject({ stage: "site_survey", title: "Created conservatory tank", targetInstallDate: "2027-03-01", leadId: lead.id });
    const [client] = await db().select().from(users).where(eq(users.id, p.clientId));
    expect(client).toMatchObject({ email, role: "client", passwordHash: null });
    expect((await db().select().from(notices).where(eq(notices.recipientId, client.id))).map((n) => n.kind)).toEqual(["invitation"]);
    expect(await db().select().from(projectCrew).where(eq(projectCrew.projectId, p.id))).toHaveLength(1);
    const [event] = await db().select().from(stageEvents).where(eq(stageEvents.projectId, p.id));
    expect(event).toMatchObject({ fromStage: null, toStage: "site_survey", reason: "Project created" });
    const board = await s.get("/api/projects");
    const column = board.json.cards.filter((c: { stage: string }) => c.stage === "site_survey");
    expect(column.at(-1).id).toBe(p.id);

    const dup = await s.post("/api/projects", { clientMode: "new", clientId: "", clientName: "Again", clientEmail: email, title: "Second", siteAddress: "9 Invented Way", siteTown: "Nowhere", targetInstallDate: "", leadId: "", crewIds: [], tankSummary: "" });
    expect(dup.status).toBe(409);
    expect(dup.json.fields.email).toBeTruthy();
  });

  it("refuses crew creating projects, and a crew id that isn't crew", async () => {
    const t = await makeTeam();
    const body = { clientMode: "existing", clientId: t.client.id, clientName: "", clientEmail: "", title: "Crew-made", siteAddress: "1 Road", siteTown: "Town", targetInstallDate: "", leadId: "", crewIds: [], tankSummary: "" };
    expect((await (await signedIn(t.crew)).post("/api/projects", body)).status).toBe(403);
    const bad = await (await signedIn(t.lead)).post("/api/projects", { ...body, crewIds: [t.client.id] });
    expect(bad.status).toBe(400);
    expect(bad.json.fields.crewIds).toBeTruthy();
  });

  it("lets the lead edit details under the version, and crew read but not edit", async () => {
    const t = await makeTeam();
    const lead = await signedIn(t.lead);
    const res = await lead.patch(`/api/projects/${t.project.id}`, { version: t.project.version, title: "Renamed tank", siteTown: "Elsewhere", crewIds: [t.crew.id, t.otherCrew.id] });
    expect(res.status).toBe(200);
    expect(res.json.version).toBe(t.project.version + 1);
    const got = await (await signedIn(t.otherCrew)).get(`/api/projects/${t.project.id}`);
    expect(got.status).toBe(200);
    expect(got.json).toMatchObject({ title: "Renamed tank", siteTown: "Elsewhere" });
    expect((await (await signedIn(t.crew)).patch(`/api/projects/${t.project.id}`, { version: 2, title: "Crew rename" })).status).toBe(403);
  });
});
