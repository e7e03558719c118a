import { describe, expect, it } from "vitest";
import { and, eq, sql } from "drizzle-orm";
import { db } from "@/db";
import { users, waterTests } from "@/db/schema";
import { makeTeam } from "../support/fixtures";
import { anonymous, signedIn } from "../support/http";
import { hoursAgo } from "./water-support";

const reading = (over: Record<string, unknown> = {}) => ({
  takenAt: hoursAgo(1).toISOString(),
  ammoniaMgL: 1,
  nitriteMgL: 0.5,
  nitrateMgL: 5,
  pH: 7.8,
  temperature: 25,
  temperatureUnit: "C",
  khDkh: 6,
  notes: "Morning test",
  ...over,
});

async function countTests(projectId: string) {
  const [{ n }] = await db().select({ n: sql<number>`count(*)::int` }).from(waterTests).where(eq(waterTests.projectId, projectId));
  return n;
}

describe("water-test log", () => {
  it("lets assigned crew and the owning client log tests, and hides the project from others", async () => {
    const t = await makeTeam("cycling");
    const crew = await (await signedIn(t.crew)).post(`/api/projects/${t.project.id}/water-tests`, reading());
    expect(crew.status).toBe(201);
    expect(crew.json.test.takenBy).toBe(t.crew.id);
    const client = await (await signedIn(t.client)).post(`/api/projects/${t.project.id}/water-tests`, reading({ ammoniaMgL: 0, notes: "" }));
    expect(client.status).toBe(201);

    expect((await (await signedIn(t.otherClient)).post(`/api/projects/${t.project.id}/water-tests`, reading())).status).toBe(404);
    expect((await (await signedIn(t.otherCrew)).post(`/api/projects/${t.project.id}/water-tests`, reading())).status).toBe(404);
    expect((await (await signedIn(t.otherClient)).get(`/api/projects/${t.project.id}/water-tests`)).status).toBe(404);
    expect((await anonymous().post(`/api/projects/${t.project.id}/water-tests`, reading())).status).toBe(401);
    expect(await countTests(t.project.id)).toBe(2);

    const list = await (await signedIn(t.lead)).get(`/api/projects/${t.project.id}/water-tests`);
    expect(list.status).toBe(200);
    expect(list.json.tests).toHaveLength(2);
    const crewRow = list.json.tests.find((r: { id: string }) => r.id === crew.json.test.id);
    expect(crewRow.takenBy.name).toBe(t.crew.name);
    // Emerson et al. (1975): pKa at 25 °C = 0.09018 + 2729.92 / 298.15 = 9.246, so at pH 7.8
    // 1 / (10^1.446 + 1) = 3.46 % of total ammonia is NH3.
    expect(crewRow.freeAmmoniaMgL).toBeCloseTo(0.0346, 3);
  });

  it("stores °C when an imperial user types °F", async () => {
    const t = await makeTeam("cycling");
    await db().update(users).set({ unitSystem: "imperial" }).where(eq(users.id, t.crew.id));
    const res = await (await signedIn(t.crew)).post(`/api/projects/${t.project.id}/water-tests`, reading({ temperature: 77, temperatureUnit: undefined }));
    expect(res.status).toBe(201);
    // 77 °F = 25 °C (NIST SP 811 conversion).
    expect(res.json.test.tempC).toBeCloseTo(25, 6);
  });

  it("refuses impossible values and future dates field by field, saving nothing", async () => {
    const t = await makeTeam("cycling");
    const s = await signedIn(t.crew);
    const bad = await s.post(`/api/projects/${t.project.id}/water-tests`, reading({ pH: 15, nitriteMgL: 1000, ammoniaMgL: -1, temperature: 80 }));
    expect(bad.status).toBe(400);
    expect(bad.json.fields.pH).toMatch(/between 0 and 14/);
    expect(bad.json.fields.nitriteMgL).toMatch(/isn't a believable/);
    expect(bad.json.fields.ammoniaMgL).toMatch(/below zero/);
    expect(bad.json.fields.temperature).toMatch(/between 0 and 40/);

    const future = await s.post(`/api/projects/${t.project.id}/water-tests`, reading({ takenAt: new Date(Date.now() + 3 * 3_600_000).toISOString() }));
    expect(future.status).toBe(400);
    expect(future.json.fields.takenAt).toMatch(/future/);

    const words = await s.post(`/api/projects/${t.project.id}/water-tests`, reading({ ammoniaMgL: "lots", takenAt: "yesterday" }));
    expect(words.status).toBe(400);
    expect(words.json.fields.ammoniaMgL).toBeTruthy();
    expect(words.json.fields.takenAt).toBeTruthy();

    const empty = await s.post(`/api/projects/${t.project.id}/water-tests`, { takenAt: hoursAgo(1).toISOString() });
    expect(empty.status).toBe(400);
    expect(empty.json.fields.ammoniaMgL).toMatch(/at least one/);
    expect(await countTests(t.project.id)).toBe(0);
  });

  it("lets only the lead void or correct, keeping the old row with the reason", async () => {
    const t = await makeTeam("cycling");
    const created = await (await signedIn(t.client)).post(`/api/projects/${t.project.id}/water-tests`, reading({ ammoniaMgL: 8 }));
    const id = created.json.test.id as string;

    const clientVoid = await (await signedIn(t.client)).post(`/api/projects/${t.project.id}/water-tests/${id}/void`, { reason: "typo" });
    expect(clientVoid.status).toBe(403);
    const crewVoid = await (await signedIn(t.crew)).post(`/api/projects/${t.project.id}/water-tests/${id}/void`, { reason: "typo" });
    expect(crewVoid.status).toBe(403);

    const lead = await signedIn(t.lead);
    const noReason = await lead.post(`/api/projects/${t.project.id}/water-tests/${id}/correct`, { ...reading({ ammoniaMgL: 0.5 }), reason: "" });
    expect(noReason.status).toBe(400);
    expect(noReason.json.fields.reason).toBeTruthy();

    const corrected = await lead.post(`/api/projects/${t.project.id}/water-tests/${id}/correct`, { ...reading({ ammoniaMgL: 0.5 }), reason: "Read the wrong card" });
    expect(corrected.status).toBe(201);
    const [old] = await db().select().from(waterTests).where(eq(waterTests.id, id));
    expect(old.voidedAt).not.toBeNull();
    expect(old.voidedBy).toBe(t.lead.id);
    expect(old.voidReason).toMatch(/Read the wrong card/);
    expect(old.ammoniaMgL).toBe(8);
    const [fresh] = await db().select().from(waterTests).where(and(eq(waterTests.projectId, t.project.id), eq(waterTests.correctsId, id)));
    expect(fresh.ammoniaMgL).toBe(0.5);
    expect(fresh.takenBy).toBe(t.client.id);

    const again = await lead.post(`/api/projects/${t.project.id}/water-tests/${id}/void`, { reason: "twice" });
    expect(again.status).toBe(409);

    const voided = await lead.post(`/api/projects/${t.project.id}/water-tests/${fresh.id}/void`, { reason: "Sample was from the tap" });
    expect(voided.status).toBe(200);
    expect(await countTests(t.project.id)).toBe(2);

    const list = await lead.get(`/api/projects/${t.project.id}/water-tests`);
    expect(list.json.tests.every((r: { voided: boolean }) => r.voided)).toBe(true);
    expect((await lead.post(`/api/projects/${t.project.id}/water-tests/00000000-0000-4000-8000-000000000000/void`, { reason: "nope" })).status).toBe(404);
  });
});

describe("the water & cycling page", () => {
  it("shows the owning client the log form without lead or crew controls, and shows staff the dosing tools", async () => {
    const t = await makeTeam("cycling");
    const path = `/projects/${t.project.id}/water`;
    const client = await (await signedIn(t.client)).get(path);
    expect(client.status).toBe(200);
    expect(client.text).toContain("Log a water test");
    expect(client.text).toContain("No water tests yet");
    expect(client.text).not.toContain("Ammonia dosing");

    const crew = await (await signedIn(t.crew)).get(path);
    expect(crew.text).toContain("Ammonia dosing");
    expect(crew.text).toContain("Handling ammonia solution");

    const other = await (await signedIn(t.otherClient)).get(path);
    expect(other.text).toContain("Nothing here, or not for you");
    expect(other.text).not.toContain(t.project.title);
  });
});
