import { describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { siteSurveys, tankDesigns, users } from "@/db/schema";
import { makeTeam } from "../support/fixtures";
import { anonymous, signedIn } from "../support/http";
import { completeSurvey, heavyDesign, lightDesign } from "../unit/survey/fixtures";

const surveyRow = async (projectId: string) => (await db().select().from(siteSurveys).where(eq(siteSurveys.projectId, projectId)))[0];
const designRow = async (projectId: string) => (await db().select().from(tankDesigns).where(eq(tankDesigns.projectId, projectId)))[0];

describe("site survey", () => {
  it("saves a draft as incomplete, naming what is missing, then marks it complete", async () => {
    const t = await makeTeam();
    const s = await signedIn(t.crew);
    const draft = { roomUse: "living", floorType: "timber joists", doorWidthMm: 810 };
    const res = await s.request("PUT", `/api/projects/${t.project.id}/survey`, draft);
    expect(res.status).toBe(200);
    expect(res.json.complete).toBe(false);
    expect(res.json.missing).toContain("joistDirection");
    expect(res.json.missingLabels).toContain("Narrowest door height");
    let row = await surveyRow(t.project.id);
    expect(row.complete).toBe(false);
    expect(row.data).toMatchObject(draft);
    expect(row.updatedBy).toBe(t.crew.id);

    const done = await s.request("PUT", `/api/projects/${t.project.id}/survey`, completeSurvey());
    expect(done.status).toBe(200);
    expect(done.json.complete).toBe(true);
    expect(done.json.missing).toEqual([]);
    row = await surveyRow(t.project.id);
    expect(row.complete).toBe(true);
    expect(row.data).toMatchObject({ doorWidthMm: 820, floorType: "concrete slab" });
  });

  it("refuses bad values with a message per field and keeps what was saved", async () => {
    const t = await makeTeam();
    const s = await signedIn(t.lead);
    await s.request("PUT", `/api/projects/${t.project.id}/survey`, completeSurvey());
    const res = await s.request("PUT", `/api/projects/${t.project.id}/survey`, { ...completeSurvey(), doorWidthMm: 0, roomLengthMm: -3, doorHeightMm: 99_000 });
    expect(res.status).toBe(400);
    expect(Object.keys(res.json.fields).sort()).toEqual(["doorHeightMm", "doorWidthMm", "roomLengthMm"]);
    const row = await surveyRow(t.project.id);
    expect(row.data).toMatchObject({ doorWidthMm: 820, roomLengthMm: 5200 });
    expect(row.complete).toBe(true);
  });

  it("lets assigned crew edit, 404s other crew and the other client, and 403s the owning client", async () => {
    const t = await makeTeam();
    expect((await (await signedIn(t.crew)).request("PUT", `/api/projects/${t.project.id}/survey`, {})).status).toBe(200);
    expect((await (await signedIn(t.otherCrew)).request("PUT", `/api/projects/${t.project.id}/survey`, {})).status).toBe(404);
    expect((await (await signedIn(t.otherClient)).request("PUT", `/api/projects/${t.project.id}/survey`, {})).status).toBe(404);
    expect((await (await signedIn(t.client)).request("PUT", `/api/projects/${t.project.id}/survey`, completeSurvey())).status).toBe(403);
    expect((await (await signedIn(t.client)).get(`/api/projects/${t.project.id}/survey`)).status).toBe(403);
    expect((await anonymous().request("PUT", `/api/projects/${t.project.id}/survey`, {})).status).toBe(401);
    const row = await surveyRow(t.project.id);
    expect(row.complete).toBe(false);
    expect(row.updatedBy).toBe(t.crew.id);
  });

  it("shows the survey page to lead and crew, and not to the client", async () => {
    const t = await makeTeam();
    expect((await (await signedIn(t.lead)).get(`/projects/${t.project.id}/survey`)).status).toBe(200);
    expect((await (await signedIn(t.crew)).get(`/projects/${t.project.id}/survey`)).status).toBe(200);
    // The section streams behind its loading state, so the refusal shows as the not-found page.
    const client = await (await signedIn(t.client)).get(`/projects/${t.project.id}/survey`);
    expect(client.text).not.toContain("Save survey");
    expect(client.text).toContain("Nothing here, or not for you");
    const other = await (await signedIn(t.otherCrew)).get(`/projects/${t.project.id}/load-sheet`);
    expect(other.text).not.toContain(t.project.title);
    expect(other.text).toContain("Nothing here, or not for you");
  });
});

describe("tank design", () => {
  it("saves a design in SI and answers with the results", async () => {
    const t = await makeTeam("stand_load_check");
    const s = await signedIn(t.crew);
    await s.request("PUT", `/api/projects/${t.project.id}/survey`, completeSurvey());
    const res = await s.request("PUT", `/api/projects/${t.project.id}/design`, lightDesign());
    expect(res.status).toBe(200);
    expect(res.json.results.floor.verdict).toBe("under");
    expect(res.json.results.load.netVolumeL).toBeGreaterThan(30);
    expect(res.json.results.access.tank.fits).toBe(true);
    expect((await designRow(t.project.id)).data).toEqual(lightDesign());
  });

  const bad: [string, (d: ReturnType<typeof lightDesign>) => unknown, string][] = [
    ["a zero length", (d) => ({ ...d, lengthMm: 0 }), "lengthMm"],
    ["a negative width", (d) => ({ ...d, widthMm: -450 }), "widthMm"],
    ["a missing height", (d) => ({ ...d, heightMm: undefined }), "heightMm"],
    ["a tank longer than 10 m", (d) => ({ ...d, lengthMm: 12_000, stand: { ...d.stand, lengthMm: 12_000 } }), "lengthMm"],
    ["the water level above the rim", (d) => ({ ...d, waterBelowRimMm: -20 }), "waterBelowRimMm"],
    ["panels thicker than the tank", (d) => ({ ...d, panelThicknessMm: 400 }), "panelThicknessMm"],
    ["a leg count of zero", (d) => ({ ...d, stand: { ...d.stand, footprint: { kind: "legs", count: 0, legLengthMm: 80, legWidthMm: 80 } } }), "stand.footprint.count"],
  ];
  for (const [what, change, field] of bad) {
    it(`refuses ${what} with a field message and saves nothing`, async () => {
      const t = await makeTeam();
      const s = await signedIn(t.lead);
      const res = await s.request("PUT", `/api/projects/${t.project.id}/design`, change(lightDesign()));
      expect(res.status).toBe(400);
      expect(res.json.fields[field]).toBeTruthy();
      expect(await designRow(t.project.id)).toBeUndefined();
    });
  }

  it("keeps the stored design when a change is refused", async () => {
    const t = await makeTeam();
    const s = await signedIn(t.lead);
    await s.request("PUT", `/api/projects/${t.project.id}/design`, heavyDesign());
    const res = await s.request("PUT", `/api/projects/${t.project.id}/design`, { ...heavyDesign(), heightMm: 0 });
    expect(res.status).toBe(400);
    expect((await designRow(t.project.id)).data).toEqual(heavyDesign());
  });

  it("saves a tank too big for the door and room, with warnings", async () => {
    const t = await makeTeam();
    const s = await signedIn(t.lead);
    await s.request("PUT", `/api/projects/${t.project.id}/survey`, { ...completeSurvey(), doorWidthMm: 550, doorHeightMm: 1900, roomLengthMm: 1500, roomWidthMm: 1400 });
    const res = await s.request("PUT", `/api/projects/${t.project.id}/design`, heavyDesign());
    expect(res.status).toBe(200);
    expect(res.json.results.access.tank.fits).toBe(false);
    expect(res.json.warnings.join(" ")).toMatch(/narrowest door/);
    expect(res.json.warnings.join(" ")).toMatch(/larger than the room/);
    expect(await designRow(t.project.id)).toBeTruthy();
  });

  it("lets crew edit only assigned projects, and refuses clients", async () => {
    const t = await makeTeam();
    expect((await (await signedIn(t.otherCrew)).request("PUT", `/api/projects/${t.project.id}/design`, lightDesign())).status).toBe(404);
    expect((await (await signedIn(t.client)).request("PUT", `/api/projects/${t.project.id}/design`, lightDesign())).status).toBe(403);
    expect((await (await signedIn(t.otherClient)).request("PUT", `/api/projects/${t.project.id}/design`, lightDesign())).status).toBe(404);
    expect(await designRow(t.project.id)).toBeUndefined();
    expect((await (await signedIn(t.crew)).request("PUT", `/api/projects/${t.project.id}/design`, lightDesign())).status).toBe(200);
  });
});

describe("units", () => {
  it("stores each person's choice of units, and refuses anything else", async () => {
    const t = await makeTeam();
    const s = await signedIn(t.crew);
    const res = await s.patch("/api/me/units", { unitSystem: "imperial" });
    expect(res.status).toBe(200);
    const [row] = await db().select({ u: users.unitSystem }).from(users).where(eq(users.id, t.crew.id));
    expect(row.u).toBe("imperial");
    expect((await s.get("/api/me/units")).json.unitSystem).toBe("imperial");
    const badRes = await s.patch("/api/me/units", { unitSystem: "cubits" });
    expect(badRes.status).toBe(400);
    expect(badRes.json.fields.unitSystem).toBeTruthy();
    const [after] = await db().select({ u: users.unitSystem }).from(users).where(eq(users.id, t.crew.id));
    expect(after.u).toBe("imperial");
    expect((await anonymous().patch("/api/me/units", { unitSystem: "metric" })).status).toBe(401);
  });
});
