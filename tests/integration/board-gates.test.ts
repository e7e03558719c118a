import { describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { db } from "@/db";
import { stageEvents } from "@/db/schema";
import { getProject, makeTeam } from "../support/fixtures";
import { signedIn } from "../support/http";
import { approveLoad, changeDesign, completeSurvey, finishCycle, recordLeakChecks, recordStocking, tickAquascape } from "./board-support";
import { payDeposit } from "./money-support";
import type { Stage } from "@/lib/stages/stages";

async function move(s: Awaited<ReturnType<typeof signedIn>>, id: string, toStage: Stage, extra: Record<string, unknown> = {}) {
  const p = await getProject(id);
  return s.post(`/api/projects/${id}/move`, { toStage, version: p.version, ...extra });
}

describe("the gates between stages", () => {
  it("into stand & load check: refuses until the survey is complete", async () => {
    const t = await makeTeam("site_survey");
    const s = await signedIn(t.crew);
    let res = await move(s, t.project.id, "stand_load_check");
    expect(res.status).toBe(422);
    expect(res.json.reasons.join(" ")).toContain("The site survey isn't complete");
    await completeSurvey(t.project, t.crew, false);
    res = await move(s, t.project.id, "stand_load_check");
    expect(res.status).toBe(422);
    expect((await getProject(t.project.id)).stage).toBe("site_survey");

    const t2 = await makeTeam("site_survey");
    await completeSurvey(t2.project, t2.crew);
    res = await move(await signedIn(t2.crew), t2.project.id, "stand_load_check");
    expect(res.status).toBe(200);
    const after = await getProject(t2.project.id);
    expect(after.stage).toBe("stand_load_check");
    expect(after.version).toBe(t2.project.version + 1);
    const events = await db().select().from(stageEvents).where(eq(stageEvents.projectId, t2.project.id));
    expect(events).toHaveLength(1);
    expect(events[0]).toMatchObject({ fromStage: "site_survey", toStage: "stand_load_check", byUserId: t2.crew.id, override: false });
  });

  it("into aquascape: needs a live approval of the current design", async () => {
    const t = await makeTeam("stand_load_check");
    await payDeposit(t.project, t.client, t.lead);
    const s = await signedIn(t.lead);
    let res = await move(s, t.project.id, "aquascape");
    expect(res.status).toBe(422);
    expect(res.json.reasons).toEqual(["The load check hasn't been approved by the lead."]);
    await approveLoad(t.project, t.lead, { lengthMm: 1200 });
    await changeDesign(t.project, { lengthMm: 1500 });
    res = await move(s, t.project.id, "aquascape");
    expect(res.status).toBe(422);
    expect(res.json.reasons).toEqual(["The load check was approved for an earlier design; approve it again."]);
    await approveLoad(t.project, t.lead, { lengthMm: 1500 });
    res = await move(s, t.project.id, "aquascape");
    expect(res.status).toBe(200);
  });

  it("into fill & leak test: every live aquascape item ticked, counting the newest tick", async () => {
    const t = await makeTeam("aquascape");
    const s = await signedIn(t.crew);
    const total = await tickAquascape(t.project, t.crew, 1);
    let res = await move(s, t.project.id, "fill_leak_test");
    expect(res.status).toBe(422);
    expect(res.json.reasons[0]).toMatch(new RegExp(`1 item is left of ${total}`));
    const t2 = await makeTeam("aquascape");
    await tickAquascape(t2.project, t2.crew);
    res = await move(await signedIn(t2.crew), t2.project.id, "fill_leak_test");
    expect(res.status).toBe(200);
  });

  it("into cycling: the fill and a passed 24-hour check, the newest one counting", async () => {
    const t = await makeTeam("fill_leak_test");
    const s = await signedIn(t.crew);
    let res = await move(s, t.project.id, "cycling");
    expect(res.status).toBe(422);
    expect(res.json.reasons).toContain("The fill hasn't been recorded.");
    await recordLeakChecks(t.project, t.crew, false);
    res = await move(s, t.project.id, "cycling");
    expect(res.status).toBe(422);
    expect(res.json.reasons.join(" ")).toContain("didn't pass");
    const t2 = await makeTeam("fill_leak_test");
    await recordLeakChecks(t2.project, t2.crew, true);
    expect((await move(await signedIn(t2.crew), t2.project.id, "cycling")).status).toBe(200);
  });

  it("into first stocking: the cycle gate's own reasons, then open once the cycle is done", async () => {
    const t = await makeTeam("cycling");
    const s = await signedIn(t.crew);
    let res = await move(s, t.project.id, "first_stocking");
    expect(res.status).toBe(422);
    expect(res.json.reasons.join(" ")).toMatch(/No water tests|cycle hasn't started|No ammonia or nitrite/);
    await finishCycle(t.project, t.crew);
    res = await move(s, t.project.id, "first_stocking");
    expect(res.status, JSON.stringify(res.json)).toBe(200);
  });

  it("into in service: at least one batch of fish", async () => {
    const t = await makeTeam("first_stocking");
    const s = await signedIn(t.crew);
    let res = await move(s, t.project.id, "in_service");
    expect(res.status).toBe(422);
    expect(res.json.reasons[0]).toContain("No fish have been recorded");
    await recordStocking(t.project, t.crew);
    res = await move(s, t.project.id, "in_service");
    expect(res.status).toBe(200);
  });

  it("a jump of several stages must pass every gate in between", async () => {
    const t = await makeTeam("site_survey");
    await completeSurvey(t.project, t.lead);
    const s = await signedIn(t.lead);
    let res = await move(s, t.project.id, "fill_leak_test");
    expect(res.status).toBe(422);
    expect(res.json.reasons.some((r: string) => r.includes("load check"))).toBe(true);
    expect(res.json.reasons.some((r: string) => r.includes("site survey"))).toBe(false);
    await approveLoad(t.project, t.lead);
    await tickAquascape(t.project, t.lead);
    res = await move(s, t.project.id, "fill_leak_test");
    expect(res.status).toBe(422);
    expect(res.json.reasons).toEqual(["Into Aquascape: The deposit isn't paid yet: the client hasn't accepted a quote."]);
    await payDeposit(t.project, t.client, t.lead);
    res = await move(s, t.project.id, "fill_leak_test");
    expect(res.status).toBe(200);
    const events = await db().select().from(stageEvents).where(and(eq(stageEvents.projectId, t.project.id), eq(stageEvents.toStage, "fill_leak_test")));
    expect(events).toHaveLength(1);
  });

  it("the lead passes a closed gate with a reason, kept on the timeline; crew can't", async () => {
    const t = await makeTeam("site_survey");
    const crewRes = await move(await signedIn(t.crew), t.project.id, "stand_load_check", { overrideReason: "Client measured it themselves" });
    expect(crewRes.status).toBe(403);
    expect(crewRes.json.error).toContain("Only the lead");
    expect((await getProject(t.project.id)).stage).toBe("site_survey");

    const lead = await signedIn(t.lead);
    const short = await move(lead, t.project.id, "stand_load_check", { overrideReason: "ok" });
    expect(short.status).toBe(400);
    expect(short.json.fields.overrideReason).toBeTruthy();
    const res = await move(lead, t.project.id, "stand_load_check", { overrideReason: "Survey done on paper; typing it up this week" });
    expect(res.status).toBe(200);
    expect(res.json.override).toBe(true);
    const [event] = await db().select().from(stageEvents).where(eq(stageEvents.projectId, t.project.id));
    expect(event.override).toBe(true);
    expect(event.reason).toBe("Survey done on paper; typing it up this week");
    expect(event.gateReasons?.[0]).toContain("The site survey isn't complete");
    const page = await lead.get(`/projects/${t.project.id}`);
    expect(page.text).toContain("Gate passed by the lead");
  });

  it("going back needs a reason, from the lead or assigned crew", async () => {
    const t = await makeTeam("aquascape");
    const s = await signedIn(t.crew);
    const noReason = await move(s, t.project.id, "stand_load_check");
    expect(noReason.status).toBe(400);
    expect(noReason.json.fields.reason).toBeTruthy();
    const res = await move(s, t.project.id, "stand_load_check", { reason: "Stand needs re-levelling" });
    expect(res.status).toBe(200);
    const [event] = await db().select().from(stageEvents).where(eq(stageEvents.projectId, t.project.id));
    expect(event).toMatchObject({ fromStage: "aquascape", toStage: "stand_load_check", reason: "Stand needs re-levelling", override: false });
  });
});
