import { describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { company, loadApprovals, siteSurveys, tankDesigns } from "@/db/schema";
import { rescreenOldApprovals } from "@/db/queries/load-rescreen";
import { loadGateFacts } from "@/db/queries/gate-facts";
import { loadCheck } from "@/lib/survey/load-check";
import { makeTeam } from "../support/fixtures";
import { signedIn, type Session } from "../support/http";
import { joistSurvey, lightDesign } from "../unit/survey/fixtures";

const approvals = (projectId: string) => db().select().from(loadApprovals).where(eq(loadApprovals.projectId, projectId));
const designRow = async (projectId: string) => (await db().select().from(tankDesigns).where(eq(tankDesigns.projectId, projectId)))[0];
const surveyRow = async (projectId: string) => (await db().select().from(siteSurveys).where(eq(siteSurveys.projectId, projectId)))[0];

async function approved() {
  const t = await makeTeam("stand_load_check");
  const lead = (await signedIn(t.lead)) as Session;
  const url = `/api/projects/${t.project.id}`;
  expect((await lead.request("PUT", `${url}/survey`, joistSurvey())).status).toBe(200);
  expect((await lead.request("PUT", `${url}/design`, lightDesign())).status).toBe(200);
  expect((await lead.post(`${url}/load-approval`, {})).status).toBe(201);
  return { ...t, lead, url };
}

async function gateReasons(projectId: string): Promise<{ state: string; why: string | null | undefined }> {
  const facts = (await loadGateFacts([projectId])).get(projectId)!;
  return { state: facts.loadApproval, why: facts.loadApprovalStaleWhy };
}

describe("top edge on the design", () => {
  it("is stored, defaults to an open top, and an unknown value is a 400 with nothing saved", async () => {
    const t = await makeTeam("stand_load_check");
    const s = await signedIn(t.crew);
    const url = `/api/projects/${t.project.id}/design`;
    const { topEdge: _omit, ...noEdge } = lightDesign();
    const saved = await s.request("PUT", url, noEdge);
    expect(saved.status).toBe(200);
    expect((await designRow(t.project.id)).data.topEdge).toBe("free");
    const bad = await s.request("PUT", url, { ...lightDesign(), topEdge: "half" });
    expect(bad.status).toBe(400);
    expect(bad.json.fields.topEdge).toMatch(/top edge/);
    expect((await designRow(t.project.id)).data.topEdge).toBe("free");
  });
});

describe("floor inputs are checked", () => {
  it("joist spacing of zero or absurd size, a span of zero, and a position past the span are 400s with field messages", async () => {
    const t = await makeTeam();
    const s = await signedIn(t.lead);
    const url = `/api/projects/${t.project.id}/survey`;
    expect((await s.request("PUT", url, joistSurvey())).status).toBe(200);
    const res = await s.request("PUT", url, { ...joistSurvey(), joistSpacingMm: 0, joistSpanMm: 0 });
    expect(res.status).toBe(400);
    expect(res.json.fields.joistSpacingMm).toMatch(/more than zero/);
    expect(res.json.fields.joistSpanMm).toMatch(/more than zero/);
    const absurd = await s.request("PUT", url, { ...joistSurvey(), joistSpacingMm: 4000, joistSpanMm: 40_000 });
    expect(absurd.status).toBe(400);
    expect(absurd.json.fields.joistSpacingMm).toMatch(/Check the units/);
    expect(absurd.json.fields.joistSpanMm).toMatch(/Check the units/);
    const past = await s.request("PUT", url, { ...joistSurvey(), bearingWallDistanceMm: 3600 });
    expect(past.status).toBe(400);
    expect(past.json.fields.bearingWallDistanceMm).toMatch(/past the joists' span/);
    expect((await surveyRow(t.project.id)).data).toEqual(joistSurvey());
  });
});

describe("an approved load check goes stale with a plain reason", () => {
  it("when the top edge changes", async () => {
    const t = await approved();
    expect((await gateReasons(t.project.id)).state).toBe("current");
    expect((await t.lead.request("PUT", `${t.url}/design`, { ...lightDesign(), topEdge: "free" })).status).toBe(200);
    const g = await gateReasons(t.project.id);
    expect(g.state).toBe("stale");
    expect(g.why).toBe("design");
    const view = await t.lead.get(`${t.url}/load-approval`);
    expect(view.json.approval.current).toBe(false);
  });

  it("when the floor inputs change (joist spacing), and again current when they go back", async () => {
    const t = await approved();
    expect((await t.lead.request("PUT", `${t.url}/survey`, { ...joistSurvey(), joistSpacingMm: 600 })).status).toBe(200);
    const g = await gateReasons(t.project.id);
    expect(g.state).toBe("stale");
    expect(g.why).toBe("floor");
    const page = await t.lead.get(`/projects/${t.project.id}/survey`);
    expect(page.text).toContain("The floor details or the company&#x27;s building code changed");
    expect((await t.lead.request("PUT", `${t.url}/survey`, joistSurvey())).status).toBe(200);
    expect((await gateReasons(t.project.id)).state).toBe("current");
  });

  it("when the company's building code changes", async () => {
    const t = await approved();
    const before = await db().select({ code: company.floorCode }).from(company);
    try {
      expect((await t.lead.request("PUT", "/api/settings/floor-code", { floorCode: "en-uk" })).status).toBe(200);
      expect((await gateReasons(t.project.id)).why).toBe("floor");
      expect((await t.lead.request("PUT", "/api/settings/floor-code", { floorCode: "nowhere" })).status).toBe(400);
      expect((await (await signedIn(t.crew)).request("PUT", "/api/settings/floor-code", { floorCode: "us-irc" })).status).toBe(403);
    } finally {
      await db().update(company).set({ floorCode: before[0]?.code ?? "us-irc" });
    }
  });

  it("when an approval made under the earlier rules gets a different verdict now", async () => {
    const t = await approved();
    // An approval recorded under the earlier rules for an open-top design whose glass passed then.
    const design = { ...lightDesign(), topEdge: "free" as const };
    await db().update(tankDesigns).set({ data: design }).where(eq(tankDesigns.projectId, t.project.id));
    const old = loadCheck(design, joistSurvey());
    const snapshot = { ...JSON.parse(JSON.stringify(old)), glass: { ...old.glass, ok: true } };
    await db().update(loadApprovals).set({ designSnapshot: design, resultSnapshot: snapshot, floorBasis: null, rulesVersion: 1 }).where(eq(loadApprovals.projectId, t.project.id));
    expect((await gateReasons(t.project.id)).state).toBe("current");

    await rescreenOldApprovals();
    const g = await gateReasons(t.project.id);
    expect(g.state).toBe("stale");
    expect(g.why).toMatch(/earlier screening rules.*glass check now fails/);
    const [row] = await approvals(t.project.id);
    expect(row.rulesVersion).toBe(2);
    expect(row.floorBasis).toMatchObject({ floorType: "timber joists", joistSpacingMm: 400 });
  });

  it("but an earlier approval whose verdicts hold keeps standing", async () => {
    const t = await approved();
    await db().update(loadApprovals).set({ floorBasis: null, rulesVersion: 1 }).where(eq(loadApprovals.projectId, t.project.id));
    await rescreenOldApprovals();
    expect((await gateReasons(t.project.id)).state).toBe("current");
    const [row] = await approvals(t.project.id);
    expect(row.staleReason).toBeNull();
  });
});
