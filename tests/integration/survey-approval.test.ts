import { describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { loadApprovals, tankDesigns } from "@/db/schema";
import { makeTeam } from "../support/fixtures";
import { signedIn, type Session } from "../support/http";
import { completeSurvey, heavyDesign, joistSurvey, lightDesign } from "../unit/survey/fixtures";

const approvals = (projectId: string) => db().select().from(loadApprovals).where(eq(loadApprovals.projectId, projectId));

async function ready(design = lightDesign(), survey = completeSurvey()) {
  const t = await makeTeam("stand_load_check");
  const lead = await signedIn(t.lead);
  expect((await lead.request("PUT", `/api/projects/${t.project.id}/survey`, survey)).status).toBe(200);
  expect((await lead.request("PUT", `/api/projects/${t.project.id}/design`, design)).status).toBe(200);
  return { ...t, leadSession: lead as Session };
}

describe("load approval", () => {
  it("records the lead's approval with the design exactly as stored, and the results", async () => {
    const t = await ready();
    const res = await t.leadSession.post(`/api/projects/${t.project.id}/load-approval`, {});
    expect(res.status).toBe(201);
    expect(res.json.approval.current).toBe(true);
    expect(res.json.approval.approvedByName).toBe(t.lead.name);
    const [row] = await approvals(t.project.id);
    const [design] = await db().select().from(tankDesigns).where(eq(tankDesigns.projectId, t.project.id));
    expect(row.designSnapshot).toEqual(design.data);
    expect((row.resultSnapshot as any).floor.verdict).toBe("under");
    expect(row.approvedBy).toBe(t.lead.id);
    // The same comparison the gate makes: jsonb equality with the current design.
    const { rows } = await db().execute<{ same: boolean }>(
      `select a.design_snapshot = d.data as same from load_approvals a join tank_designs d using (project_id) where a.project_id = '${t.project.id}'` as any,
    );
    expect(rows[0].same).toBe(true);
    // Approving the same design twice is refused.
    expect((await t.leadSession.post(`/api/projects/${t.project.id}/load-approval`, {})).status).toBe(409);
  });

  it("refuses crew with 403 and records nothing", async () => {
    const t = await ready();
    const res = await (await signedIn(t.crew)).post(`/api/projects/${t.project.id}/load-approval`, {});
    expect(res.status).toBe(403);
    expect((await (await signedIn(t.client)).post(`/api/projects/${t.project.id}/load-approval`, {})).status).toBe(403);
    expect((await (await signedIn(t.otherCrew)).post(`/api/projects/${t.project.id}/load-approval`, {})).status).toBe(404);
    expect(await approvals(t.project.id)).toHaveLength(0);
  });

  it("needs the engineer's reference when the floor screens over its allowance", async () => {
    const t = await ready(heavyDesign(), joistSurvey());
    const res = await t.leadSession.post(`/api/projects/${t.project.id}/load-approval`, { engineerReference: "  " });
    expect(res.status).toBe(422);
    expect(res.json.error).toMatch(/structural engineer/);
    expect(res.json.fields.engineerReference).toBeTruthy();
    expect(await approvals(t.project.id)).toHaveLength(0);

    const ref = "Floor checked by an invented engineer, Fenwick Structures, 1 Dec 2026, ref FS-2026-118";
    const ok = await t.leadSession.post(`/api/projects/${t.project.id}/load-approval`, { engineerReference: ref });
    expect(ok.status).toBe(201);
    const [row] = await approvals(t.project.id);
    expect(row.engineerReference).toBe(ref);
    expect((row.resultSnapshot as any).floor.verdict).toBe("far over");
  });

  it("becomes stale when the design changes, and can be approved again", async () => {
    const t = await ready();
    expect((await t.leadSession.post(`/api/projects/${t.project.id}/load-approval`, {})).status).toBe(201);
    const changed = { ...lightDesign(), rockMassKg: 5 };
    expect((await (await signedIn(t.crew)).request("PUT", `/api/projects/${t.project.id}/design`, changed)).status).toBe(200);
    const after = await t.leadSession.get(`/api/projects/${t.project.id}/load-approval`);
    expect(after.json.approval.current).toBe(false);
    const page = await t.leadSession.get(`/projects/${t.project.id}/survey`);
    expect(page.text).toContain("approved for an earlier design");
    const again = await t.leadSession.post(`/api/projects/${t.project.id}/load-approval`, {});
    expect(again.status).toBe(201);
    expect(again.json.approval.current).toBe(true);
    expect(await approvals(t.project.id)).toHaveLength(2);
  });

  it("shows the earlier approval as current again when the design goes back to it", async () => {
    const t = await ready();
    const url = `/api/projects/${t.project.id}`;
    expect((await t.leadSession.post(`${url}/load-approval`, {})).status).toBe(201);
    await t.leadSession.request("PUT", `${url}/design`, { ...lightDesign(), rockMassKg: 6 });
    expect((await t.leadSession.post(`${url}/load-approval`, {})).status).toBe(201);
    await t.leadSession.request("PUT", `${url}/design`, lightDesign());
    const res = await t.leadSession.get(`${url}/load-approval`);
    expect(res.json.approval.current).toBe(true);
    expect(res.json.approval.designSnapshot).toEqual(lightDesign());
    // Nothing new to approve: the first approval stands for this design.
    expect((await t.leadSession.post(`${url}/load-approval`, {})).status).toBe(409);
  });

  it("refuses an approval for a design that changed since the lead opened it", async () => {
    const t = await ready();
    const seen = (await t.leadSession.get(`/api/projects/${t.project.id}/design`)).json.updatedAt;
    await t.leadSession.request("PUT", `/api/projects/${t.project.id}/design`, { ...lightDesign(), sumpVolumeL: 20 });
    const res = await t.leadSession.post(`/api/projects/${t.project.id}/load-approval`, { designUpdatedAt: seen });
    expect(res.status).toBe(409);
    expect(await approvals(t.project.id)).toHaveLength(0);
  });

  it("refuses to approve panels thinner than the water pressure needs", async () => {
    // 3 mm glass on a 300 mm tall tank: the check asks for about 4 mm (Roark plate coefficients, SF 3.8).
    const t = await ready({ ...lightDesign(), panelThicknessMm: 3 });
    const res = await t.leadSession.post(`/api/projects/${t.project.id}/load-approval`, {});
    expect(res.status).toBe(422);
    expect(res.json.error).toMatch(/panel/i);
    expect(await approvals(t.project.id)).toHaveLength(0);
  });

  it("needs a complete survey and a saved design", async () => {
    const t = await makeTeam();
    const lead = await signedIn(t.lead);
    expect((await lead.post(`/api/projects/${t.project.id}/load-approval`, {})).status).toBe(422);
    await lead.request("PUT", `/api/projects/${t.project.id}/survey`, completeSurvey());
    const res = await lead.post(`/api/projects/${t.project.id}/load-approval`, {});
    expect(res.status).toBe(422);
    expect(res.json.error).toMatch(/design/);
  });

  it("revokes with a reason, keeping the record, and only the lead may", async () => {
    const t = await ready();
    await t.leadSession.post(`/api/projects/${t.project.id}/load-approval`, {});
    expect((await (await signedIn(t.crew)).post(`/api/projects/${t.project.id}/load-approval/revoke`, { reason: "Crew says no" })).status).toBe(403);
    expect((await t.leadSession.request("DELETE", `/api/projects/${t.project.id}/load-approval`, { reason: "" })).status).toBe(400);
    const res = await t.leadSession.request("DELETE", `/api/projects/${t.project.id}/load-approval`, { reason: "Client wants a deeper tank" });
    expect(res.status).toBe(200);
    expect(res.json.approval.revokeReason).toBe("Client wants a deeper tank");
    const [row] = await approvals(t.project.id);
    expect(row.revokedAt).toBeTruthy();
    expect(row.revokedBy).toBe(t.lead.id);
    expect((await t.leadSession.post(`/api/projects/${t.project.id}/load-approval/revoke`, { reason: "Again" })).status).toBe(409);
    // After revoking, the same design may be approved afresh.
    expect((await t.leadSession.post(`/api/projects/${t.project.id}/load-approval`, {})).status).toBe(201);
  });
});
