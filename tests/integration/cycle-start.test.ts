import { describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { db } from "@/db";
import { projects, stageEvents } from "@/db/schema";
import { getProject, makeTeam } from "../support/fixtures";
import { signedIn } from "../support/http";
import { recordLeakChecks } from "./board-support";

const DAY = 86_400_000;

describe("the cycle's start", () => {
  it("is kept when a card goes back out of cycling and in again", async () => {
    const t = await makeTeam("cycling");
    const started = new Date(Date.now() - 10 * DAY);
    await db().update(projects).set({ cycleStartedAt: started }).where(eq(projects.id, t.project.id));
    await recordLeakChecks(t.project, t.crew, true);
    const lead = await signedIn(t.lead);
    const back = await lead.post(`/api/projects/${t.project.id}/move`, { toStage: "fill_leak_test", version: t.project.version, reason: "Dragged by mistake" });
    expect(back.status).toBe(200);
    const again = await lead.post(`/api/projects/${t.project.id}/move`, { toStage: "cycling", version: back.json.version });
    expect(again.status).toBe(200);
    expect(again.json.cycleStartedAt).toBe(started.toISOString());
    expect(again.json.cycleRestarted).toBe(false);
    const cycle = await lead.get(`/api/projects/${t.project.id}/cycle`);
    expect(cycle.json.daysSinceStart).toBeGreaterThanOrEqual(9.9);
  });

  it("restarts only when the lead chooses it, and the timeline records it", async () => {
    const t = await makeTeam("fill_leak_test");
    const started = new Date(Date.now() - 20 * DAY);
    await db().update(projects).set({ cycleStartedAt: started }).where(eq(projects.id, t.project.id));
    await recordLeakChecks(t.project, t.crew, true);
    const crew = await signedIn(t.crew);
    const refused = await crew.post(`/api/projects/${t.project.id}/move`, { toStage: "cycling", version: t.project.version, restartCycle: true });
    expect(refused.status).toBe(403);
    const lead = await signedIn(t.lead);
    const moved = await lead.post(`/api/projects/${t.project.id}/move`, { toStage: "cycling", version: t.project.version, restartCycle: true });
    expect(moved.status).toBe(200);
    expect(moved.json.cycleRestarted).toBe(true);
    expect(new Date(moved.json.cycleStartedAt).getTime()).toBeGreaterThan(started.getTime() + 19 * DAY);
    const [event] = await db().select().from(stageEvents).where(and(eq(stageEvents.projectId, t.project.id), eq(stageEvents.toStage, "cycling")));
    expect(event.cycleRestarted).toBe(true);
  });

  it("can be restarted in place by the lead with a reason, not by crew", async () => {
    const t = await makeTeam("cycling");
    await db().update(projects).set({ cycleStartedAt: new Date(Date.now() - 5 * DAY) }).where(eq(projects.id, t.project.id));
    const crew = await signedIn(t.crew);
    expect((await crew.post(`/api/projects/${t.project.id}/cycle/restart`, { reason: "The heater failed overnight" })).status).toBe(403);
    const lead = await signedIn(t.lead);
    expect((await lead.post(`/api/projects/${t.project.id}/cycle/restart`, {})).status).toBe(400);
    const ok = await lead.post(`/api/projects/${t.project.id}/cycle/restart`, { reason: "The heater failed overnight" });
    expect(ok.status).toBe(200);
    const p = await getProject(t.project.id);
    expect(Date.now() - p.cycleStartedAt!.getTime()).toBeLessThan(DAY);
    const events = await db().select().from(stageEvents).where(eq(stageEvents.projectId, t.project.id));
    expect(events.find((e) => e.cycleRestarted)?.reason).toBe("The heater failed overnight");
  });
});

describe("lateness on the board", () => {
  it("is judged against the card's own stage, not the target install date", async () => {
    const t = await makeTeam("cycling");
    // Twenty days into cycling with an install date long past: on time (cycling is expected to take 42 days by default).
    await db()
      .update(projects)
      .set({ stageEnteredAt: new Date(Date.now() - 20 * DAY), targetInstallDate: "2020-01-01" })
      .where(eq(projects.id, t.project.id));
    const late = await makeTeam("fill_leak_test");
    // Five days in a three-day fill & leak test: two days late.
    await db().update(projects).set({ stageEnteredAt: new Date(Date.now() - 5 * DAY) }).where(eq(projects.id, late.project.id));
    const lead = await signedIn(t.lead);
    const board = await lead.get("/api/projects");
    const cards = board.json.cards as { id: string; lateBy: number; expectedBy: string | null }[];
    const cycling = cards.find((c) => c.id === t.project.id)!;
    expect(cycling.lateBy).toBe(0);
    expect(new Date(cycling.expectedBy!).getTime()).toBeGreaterThan(Date.now() + 21 * DAY);
    expect(cards.find((c) => c.id === late.project.id)!.lateBy).toBe(2);
  });
});
