import { describe, expect, it } from "vitest";
import { eq, sql } from "drizzle-orm";
import { db } from "@/db";
import { ammoniaDoses } from "@/db/schema";
import { makeTeam } from "../support/fixtures";
import { signedIn } from "../support/http";
import { hoursAgo, insertReadings } from "./water-support";

const dose = (over: Record<string, unknown> = {}) => ({ dosedAt: hoursAgo(2).toISOString(), targetMgL: 2, amountMl: 3.2, sourcePercent: 10, notes: "Pure 10 % solution", ...over });

describe("ammonia doses", () => {
  it("lets crew log doses, keeps them from clients, and lets only the lead void them", async () => {
    const t = await makeTeam("cycling");
    const crew = await signedIn(t.crew);
    const created = await crew.post(`/api/projects/${t.project.id}/doses`, dose());
    expect(created.status).toBe(201);
    expect(created.json.dose.targetMgL).toBe(2);

    expect((await (await signedIn(t.client)).post(`/api/projects/${t.project.id}/doses`, dose())).status).toBe(403);
    expect((await (await signedIn(t.otherClient)).post(`/api/projects/${t.project.id}/doses`, dose())).status).toBe(404);

    const bad = await crew.post(`/api/projects/${t.project.id}/doses`, dose({ targetMgL: 500, sourcePercent: 120, dosedAt: new Date(Date.now() + 86_400_000).toISOString() }));
    expect(bad.status).toBe(400);
    expect(bad.json.fields.targetMgL).toMatch(/50 mg\/L/);
    expect(bad.json.fields.sourcePercent).toMatch(/100 %/);
    const future = await crew.post(`/api/projects/${t.project.id}/doses`, dose({ dosedAt: new Date(Date.now() + 86_400_000).toISOString() }));
    expect(future.status).toBe(400);
    expect(future.json.fields.dosedAt).toMatch(/future/);

    const [{ n }] = await db().select({ n: sql<number>`count(*)::int` }).from(ammoniaDoses).where(eq(ammoniaDoses.projectId, t.project.id));
    expect(n).toBe(1);

    const id = created.json.dose.id as string;
    expect((await crew.post(`/api/projects/${t.project.id}/doses/${id}/void`, { reason: "wrong tank" })).status).toBe(403);
    const voided = await (await signedIn(t.lead)).post(`/api/projects/${t.project.id}/doses/${id}/void`, { reason: "Logged on the wrong tank" });
    expect(voided.status).toBe(200);
    const [row] = await db().select().from(ammoniaDoses).where(eq(ammoniaDoses.id, id));
    expect(row.voidReason).toBe("Logged on the wrong tank");
    expect(row.voidedBy).toBe(t.lead.id);
  });

  it("holds the gate shut until a dose has cleared, as the cycle route reports", async () => {
    const t = await makeTeam("cycling");
    await insertReadings(t.project.id, t.crew.id, [
      { hoursAgo: 24 * 10, ammonia: 2, nitrite: 0, nitrate: 0 },
      { hoursAgo: 40, ammonia: 0, nitrite: 0, nitrate: 20 },
      { hoursAgo: 10, ammonia: 0, nitrite: 0, nitrate: 20 },
    ]);
    const lead = await signedIn(t.lead);
    expect((await lead.get(`/api/projects/${t.project.id}/cycle`)).json.ready).toBe(true);

    await (await signedIn(t.crew)).post(`/api/projects/${t.project.id}/doses`, dose({ dosedAt: hoursAgo(1).toISOString() }));
    const after = await lead.get(`/api/projects/${t.project.id}/cycle`);
    expect(after.json.ready).toBe(false);
    expect(after.json.reasons.join(" ")).toMatch(/dosed/);
    expect((await (await signedIn(t.otherClient)).get(`/api/projects/${t.project.id}/cycle`)).status).toBe(404);
  });
});
