import { randomUUID } from "node:crypto";
import { and, asc, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db";
import { equipment, equipmentServices, notices, visitTaskTicks, visits } from "@/db/schema";
import { materialiseAllPlans } from "@/db/queries/service-plans";
import { makeTeam } from "../support/fixtures";
import { signedIn, type Session } from "../support/http";

const DAY = 86_400_000;
const today = () => new Date().toISOString().slice(0, 10);

const planBody = (over: Record<string, unknown> = {}) => ({
  frequency: "weekly",
  everyWeeks: 1,
  weekday: "WE",
  startsOn: today(),
  startTime: "09:00",
  durationMinutes: 90,
  waterChangePercent: 20,
  tasks: ["Glass cleaned", "Water changed", "Filter rinsed"],
  usualAssigneeId: null,
  ...over,
});

async function planVisits(projectId: string) {
  return db().select().from(visits).where(and(eq(visits.projectId, projectId), eq(visits.kind, "service visit"))).orderBy(asc(visits.occurrenceOn));
}

/** A tank in service with a weekly plan, and its first visit moved to an hour ago so it can be reported on today. */
async function tankWithVisitDue() {
  const t = await makeTeam("in_service");
  const lead = await signedIn(t.lead);
  const saved = await lead.put(`/api/projects/${t.project.id}/service/plan`, planBody({ usualAssigneeId: t.crew.id }));
  expect(saved.status).toBe(200);
  const [first] = await planVisits(t.project.id);
  const moved = await lead.post(`/api/projects/${t.project.id}/service/visits/${first.id}/move`, { startsAt: new Date(Date.now() - 3600_000).toISOString(), assignedTo: t.crew.id });
  expect(moved.status).toBe(200);
  return { t, lead, visitId: first.id, base: `/api/projects/${t.project.id}/service/visits/${first.id}` };
}

const tick = (s: Session, base: string, taskIndex: number, clientKey: string = randomUUID()) => s.post(`${base}/ticks`, { taskIndex, done: true, clientKey });

describe("service plans", () => {
  it("writes the next eight weeks of visits, and running it again adds nothing", async () => {
    const t = await makeTeam("in_service");
    const lead = await signedIn(t.lead);
    const res = await lead.put(`/api/projects/${t.project.id}/service/plan`, planBody({ usualAssigneeId: t.crew.id }));
    expect(res.status).toBe(200);
    const rows = await planVisits(t.project.id);
    // Weekly over 56 days from now: 8 visits (a Wednesday today at 09:00 may already be past, leaving it out).
    expect(rows.length).toBeGreaterThanOrEqual(7);
    expect(rows.length).toBeLessThanOrEqual(8);
    expect(res.json.added).toBe(rows.length);
    expect(rows.every((r) => r.assignedTo === t.crew.id && r.servicePlanId === res.json.plan.id)).toBe(true);

    await materialiseAllPlans();
    await materialiseAllPlans();
    const again = await planVisits(t.project.id);
    expect(again.map((r) => r.id)).toEqual(rows.map((r) => r.id));

    const read = await (await signedIn(t.client)).get(`/api/projects/${t.project.id}/service/plan`);
    expect(read.status).toBe(200);
    expect(read.json.plan.rule).toBe("FREQ=WEEKLY;INTERVAL=1;BYDAY=WE");
  });

  it("keeps a moved and a skipped visit when the plan regenerates, and replaces only untouched ones when the rule changes", async () => {
    const t = await makeTeam("in_service");
    const lead = await signedIn(t.lead);
    const plan = await lead.put(`/api/projects/${t.project.id}/service/plan`, planBody());
    const rows = await planVisits(t.project.id);
    const [a, b] = rows.slice(-2);
    const newTime = new Date(a.startsAt.getTime() + DAY + 3600_000);
    expect((await lead.post(`/api/projects/${t.project.id}/service/visits/${a.id}/move`, { startsAt: newTime.toISOString(), assignedTo: t.crew.id })).status).toBe(200);
    expect((await lead.post(`/api/projects/${t.project.id}/service/visits/${b.id}/skip`, { reason: "Client away that week" })).status).toBe(200);

    await materialiseAllPlans();
    const after = await planVisits(t.project.id);
    expect(after).toHaveLength(rows.length);
    const movedRow = after.find((r) => r.id === a.id)!;
    expect(movedRow.startsAt.toISOString()).toBe(newTime.toISOString());
    expect(movedRow.occurrenceOn).toBe(a.occurrenceOn);
    expect(after.find((r) => r.id === b.id)!.cancelReason).toBe("Client away that week");

    // Every two weeks on Friday instead: untouched Wednesdays go, the moved and skipped ones stay.
    const changed = await lead.put(`/api/projects/${t.project.id}/service/plan`, planBody({ everyWeeks: 2, weekday: "FR", version: plan.json.plan.version }));
    expect(changed.status).toBe(200);
    const now = await planVisits(t.project.id);
    expect(now.find((r) => r.id === a.id)).toBeTruthy();
    expect(now.find((r) => r.id === b.id)).toBeTruthy();
    const fresh = now.filter((r) => r.id !== a.id && r.id !== b.id);
    expect(fresh.length).toBeGreaterThanOrEqual(4);
    expect(fresh.every((r) => new Date(`${r.occurrenceOn}T00:00:00Z`).getUTCDay() === 5)).toBe(true);

    // A stale version is refused rather than overwriting.
    const stale = await lead.put(`/api/projects/${t.project.id}/service/plan`, planBody({ version: plan.json.plan.version }));
    expect(stale.status).toBe(409);
  });

  it("lets only the lead edit a plan; crew and the client read it, others can't see it", async () => {
    const t = await makeTeam("in_service");
    const url = `/api/projects/${t.project.id}/service/plan`;
    expect((await (await signedIn(t.crew)).put(url, planBody())).status).toBe(403);
    expect((await (await signedIn(t.client)).put(url, planBody())).status).toBe(403);
    expect((await (await signedIn(t.otherCrew)).get(url)).status).toBe(404);
    expect((await (await signedIn(t.otherClient)).get(url)).status).toBe(404);
    const bad = await (await signedIn(t.lead)).put(url, planBody({ startTime: "25:00", waterChangePercent: 140 }));
    expect(bad.status).toBe(400);
    expect(bad.json.fields.startTime).toMatch(/HH:MM/);
    expect(await planVisits(t.project.id)).toHaveLength(0);
  });
});

describe("visit reports", () => {
  it("applies a retried tick once, and lets only assigned crew or the lead tick", async () => {
    const { t, base, visitId } = await tankWithVisitDue();
    const crew = await signedIn(t.crew);
    const key = `retry-${randomUUID()}`;
    const first = await tick(crew, base, 0, key);
    const again = await tick(crew, base, 0, key);
    expect(first.status).toBe(201);
    expect(again.status).toBe(200);
    expect(again.json.replayed).toBe(true);
    expect(await db().select().from(visitTaskTicks).where(eq(visitTaskTicks.visitId, visitId))).toHaveLength(1);
    expect((await tick(await signedIn(t.otherCrew), base, 1)).status).toBe(404);
    expect((await tick(await signedIn(t.client), base, 1)).status).toBe(403);
    expect((await tick(crew, base, 9)).status).toBe(404);
  });

  it("servicing equipment on the visit records it once and resets its last service", async () => {
    const { t, base } = await tankWithVisitDue();
    const [piece] = await db()
      .insert(equipment)
      .values({ projectId: t.project.id, kind: "canister filter", makeModel: "Fixture 300", lastServicedAt: new Date(Date.now() - 200 * DAY), createdBy: t.lead.id })
      .returning();
    const crew = await signedIn(t.crew);
    const before = Date.now();
    const res = await crew.post(`${base}/equipment`, { equipmentId: piece.id, clientKey: randomUUID() });
    expect(res.status).toBe(201);
    const again = await crew.post(`${base}/equipment`, { equipmentId: piece.id, clientKey: randomUUID() });
    expect(again.status).toBe(200);
    const [after] = await db().select().from(equipment).where(eq(equipment.id, piece.id));
    expect(after.lastServicedAt!.getTime()).toBeGreaterThanOrEqual(before - 1000);
    expect(await db().select().from(equipmentServices).where(eq(equipmentServices.equipmentId, piece.id))).toHaveLength(1);
    // Another tank's equipment is not found on this visit.
    const other = await makeTeam("in_service");
    const [foreign] = await db().insert(equipment).values({ projectId: other.project.id, kind: "heater", createdBy: other.lead.id }).returning();
    expect((await crew.post(`${base}/equipment`, { equipmentId: foreign.id, clientKey: randomUUID() })).status).toBe(404);
  });

  it("signs off once, e-mails the client once, locks the report, and shows the client no internal notes", async () => {
    const { t, lead, base, visitId } = await tankWithVisitDue();
    const crew = await signedIn(t.crew);
    const client = await signedIn(t.client);
    // Nothing to see for the client before sign-off.
    expect((await client.get(base)).status).toBe(404);
    expect((await crew.post(`${base}/sign-off`, {})).status).toBe(422);

    await tick(crew, base, 0);
    await tick(crew, base, 1);
    expect((await crew.patch(base, { waterChangeL: 80, clientNotes: "All clear and bright.", internalNotes: "Client's hose tap drips.", livestockNote: "All fish seen." })).status).toBe(200);
    const test = await crew.post(`${base}/water-test`, { takenAt: new Date().toISOString(), nitrateMgL: 10, salinityPpt: 34, temperatureUnit: "C" });
    expect(test.status).toBe(201);
    expect(test.json.test.salinityPpt).toBe(34);
    expect((await crew.post(`${base}/water-test`, { takenAt: new Date().toISOString(), salinityPpt: 80 })).status).toBe(400);

    const signed = await crew.post(`${base}/sign-off`, {});
    expect(signed.status).toBe(200);
    expect(signed.json.emailed).toBe(true);
    expect((await crew.post(`${base}/sign-off`, {})).status).toBe(409);
    expect((await tick(crew, base, 2)).status).toBe(409);
    expect((await crew.patch(base, { clientNotes: "changed" })).status).toBe(409);
    const [v] = await db().select().from(visits).where(eq(visits.id, visitId));
    expect(v.completedAt).not.toBeNull();

    const read = await client.get(base);
    expect(read.status).toBe(200);
    expect(read.json.report.clientNotes).toBe("All clear and bright.");
    expect(read.json.report.internalNotes).toBeNull();
    expect(JSON.stringify(read.json)).not.toContain("hose tap");
    expect((await (await signedIn(t.otherClient)).get(base)).status).toBe(404);

    // The lead reopens with a reason; crew can't. Signing off again doesn't e-mail again.
    expect((await crew.post(`${base}/reopen`, { reason: "Wrong litres" })).status).toBe(403);
    expect((await lead.post(`${base}/reopen`, { reason: "Wrong litres" })).status).toBe(200);
    expect((await crew.patch(base, { waterChangeL: 85 })).status).toBe(200);
    const resigned = await crew.post(`${base}/sign-off`, {});
    expect(resigned.status).toBe(200);
    expect(resigned.json.emailed).toBe(false);

    const mail = await db().select().from(notices).where(and(eq(notices.projectId, t.project.id), eq(notices.kind, "visit_report")));
    expect(mail).toHaveLength(1);
    expect(mail[0].toEmail).toBe(t.client.email);
    expect(mail[0].text).toContain("All clear and bright.");
    expect(mail[0].text).toContain("Glass cleaned");
    expect(mail[0].text).not.toContain("hose tap");

    // The pages say the same: the client reads the report and the plan, never the internal note.
    const clientReport = await client.get(`/projects/${t.project.id}/service/visits/${visitId}`);
    expect(clientReport.status).toBe(200);
    expect(clientReport.text).toContain("All clear and bright.");
    expect(clientReport.text).not.toContain("hose tap");
    const clientTab = await client.get(`/projects/${t.project.id}/service`);
    expect(clientTab.status).toBe(200);
    expect(clientTab.text).toContain("Every Wednesday");
    expect(clientTab.text).toContain("Glass cleaned");
    expect(clientTab.text).not.toContain("Save the plan");
    const leadReport = await lead.get(`/projects/${t.project.id}/service/visits/${visitId}`);
    expect(leadReport.text).toContain("hose tap");
    expect((await (await signedIn(t.otherCrew)).get(`/projects/${t.project.id}/service`)).status).toBe(404);
  });

  it("a client who turned visit reports off gets no e-mail, but the report still shows", async () => {
    const { t, base } = await tankWithVisitDue();
    expect((await (await signedIn(t.client)).put("/api/me/notifications", { visit_report: false })).status).toBe(200);
    const crew = await signedIn(t.crew);
    await tick(crew, base, 0);
    const signed = await crew.post(`${base}/sign-off`, {});
    expect(signed.status).toBe(200);
    expect(signed.json.emailed).toBe(false);
    expect(await db().select().from(notices).where(and(eq(notices.projectId, t.project.id), eq(notices.kind, "visit_report")))).toHaveLength(0);
    expect((await (await signedIn(t.client)).get(base)).status).toBe(200);
  });
});
