import { describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { stockingBatches } from "@/db/schema";
import { makeTeam } from "../support/fixtures";
import { signedIn } from "../support/http";
import { hoursAgo, insertReadings, nearlyCycled } from "./water-support";

const batch = (over: Record<string, unknown> = {}) => ({ description: "Six small tetras after quarantine", fishCount: 6, quarantineDays: 28, ...over });

describe("stocking batches", () => {
  it("refuses the first batch until the cycle gate is open", async () => {
    const t = await makeTeam("first_stocking");
    const crew = await signedIn(t.crew);
    const refused = await crew.post(`/api/projects/${t.project.id}/stocking-batches`, batch());
    expect(refused.status).toBe(422);
    expect(refused.json.error).toMatch(/first batch has to wait/);
    expect(refused.json.reasons.length).toBeGreaterThan(0);
    expect(refused.json.canOverride).toBe(false);
    expect(await db().select().from(stockingBatches).where(eq(stockingBatches.projectId, t.project.id))).toHaveLength(0);

    await nearlyCycled(t.project.id, t.crew.id, 40);
    await insertReadings(t.project.id, t.crew.id, [{ hoursAgo: 3, ammonia: 0, nitrite: 0, nitrate: 40 }]);
    const ok = await crew.post(`/api/projects/${t.project.id}/stocking-batches`, batch({ addedAt: hoursAgo(2).toISOString() }));
    expect(ok.status).toBe(201);
    expect(ok.json.overridden).toBe(false);

    expect((await (await signedIn(t.client)).post(`/api/projects/${t.project.id}/stocking-batches`, batch())).status).toBe(403);
    const bad = await crew.post(`/api/projects/${t.project.id}/stocking-batches`, batch({ fishCount: 0, description: "" }));
    expect(bad.status).toBe(400);
    expect(bad.json.fields.fishCount).toBeTruthy();
    expect(bad.json.fields.description).toBeTruthy();
  });

  it("holds later batches until ammonia and nitrite re-test at zero, unless the lead overrides in writing", async () => {
    const t = await makeTeam("first_stocking");
    await nearlyCycled(t.project.id, t.crew.id, 40);
    await insertReadings(t.project.id, t.crew.id, [{ hoursAgo: 12, ammonia: 0, nitrite: 0, nitrate: 40 }]);
    const crew = await signedIn(t.crew);
    const lead = await signedIn(t.lead);
    const url = `/api/projects/${t.project.id}/stocking-batches`;
    expect((await crew.post(url, batch({ addedAt: hoursAgo(10).toISOString() }))).status).toBe(201);

    const untested = await crew.post(url, batch());
    expect(untested.status).toBe(422);
    expect(untested.json.error).toMatch(/haven't been tested since the last batch/);

    await insertReadings(t.project.id, t.crew.id, [{ hoursAgo: 6, ammonia: 0.25, nitrite: 0, nitrate: 40 }]);
    const showing = await crew.post(url, batch());
    expect(showing.status).toBe(422);
    expect(showing.json.error).toMatch(/ammonia at 0.25 mg\/L/);

    const crewOverride = await crew.post(url, batch({ overrideReason: "The client is in a hurry" }));
    expect(crewOverride.status).toBe(403);

    const overridden = await lead.post(url, batch({ description: "Two cleaner shrimp", fishCount: 2, overrideReason: "Shrimp add almost no load; re-test tomorrow" }));
    expect(overridden.status).toBe(201);
    expect(overridden.json.overridden).toBe(true);
    const [row] = await db().select().from(stockingBatches).where(eq(stockingBatches.id, overridden.json.batch.id));
    expect(row.override).toBe("Shrimp add almost no load; re-test tomorrow");

    await insertReadings(t.project.id, t.crew.id, [{ hoursAgo: -0.001, ammonia: 0, nitrite: 0, nitrate: 40 }]);
    const list = await crew.get(url);
    expect(list.status).toBe(200);
    expect(list.json.batches).toHaveLength(2);
    expect(list.json.batches[1].reTest.status).toBe("zero");
  });

  it("keeps fish short of the company's quarantine out of the display unless the lead writes why", async () => {
    const t = await makeTeam("first_stocking");
    await nearlyCycled(t.project.id, t.crew.id, 40);
    await insertReadings(t.project.id, t.crew.id, [{ hoursAgo: 3, ammonia: 0, nitrite: 0, nitrate: 40 }]);
    const crew = await signedIn(t.crew);
    const url = `/api/projects/${t.project.id}/stocking-batches`;
    // The company's period is the default 28 days (common practice: about four weeks).
    const short = await crew.post(url, batch({ quarantineDays: 27 }));
    expect(short.status).toBe(422);
    expect(short.json.error).toBe(
      "New fish are quarantined for 28 days before the display; this batch had 27 days of quarantine. Put it in a holding tank through the stocking plan, or the lead records why it can go in now.",
    );
    expect(short.json.canOverride).toBe(false);
    const none = await crew.post(url, batch({ quarantineDays: null }));
    expect(none.status).toBe(422);
    expect(none.json.error).toMatch(/this batch had no quarantine recorded/);
    expect(await db().select().from(stockingBatches).where(eq(stockingBatches.projectId, t.project.id))).toHaveLength(0);

    const lead = await signedIn(t.lead);
    const waved = await lead.post(url, batch({ quarantineDays: 0, description: "Snails from our own quarantined stock", overrideReason: "Bred in our own holding system" }));
    expect(waved.status).toBe(201);
    expect(waved.json.overridden).toBe(true);
    const [row] = await db().select().from(stockingBatches).where(eq(stockingBatches.projectId, t.project.id));
    expect(row.override).toBe("Bred in our own holding system");
  });

  it("keeps fish out of a project that hasn't reached first stocking", async () => {
    const t = await makeTeam("cycling");
    const res = await (await signedIn(t.lead)).post(`/api/projects/${t.project.id}/stocking-batches`, batch({ overrideReason: "Testing" }));
    expect(res.status).toBe(409);
    expect(res.json.error).toMatch(/first stocking/);
  });
});
