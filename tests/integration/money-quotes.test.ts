import { describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { quoteAcceptances, quoteLines, quotes, tankDesigns } from "@/db/schema";
import { makeTeam } from "../support/fixtures";
import { anonymous, signedIn, type Session } from "../support/http";
import { demoDesign } from "../unit/tank/fixtures";
import { invoicesOf } from "./money-support";

type Team = Awaited<ReturnType<typeof makeTeam>>;

async function draftFromDesign(t: Team, lead: Session) {
  await db().insert(tankDesigns).values({ projectId: t.project.id, data: demoDesign() as unknown as Record<string, unknown>, updatedBy: t.lead.id });
  const res = await lead.post(`/api/projects/${t.project.id}/quotes`, { from: "design" });
  expect(res.status).toBe(201);
  return res.json.quote as { id: string; version: number };
}

const line = (o: Record<string, unknown> = {}) => ({ group: "labour", description: "Crew on site", unit: "hour", quantityMilli: 8000, unitPriceMinor: 9500, discountBp: 0, taxBp: 2000, ...o });

describe("quotes", () => {
  it("drafts from the design and the price list, refuses bad lines without changing the draft, and issues one current version", async () => {
    const t = await makeTeam("stand_load_check");
    const lead = await signedIn(t.lead);
    const draft = await draftFromDesign(t, lead);
    const lines = await db().select().from(quoteLines).where(eq(quoteLines.quoteId, draft.id));
    // The demo price list has 15 mm glass by area: the design's 4.3269 m² rounds to 4.33 (see tests/unit/money).
    const glass = lines.find((l) => l.group === "tank_glass" && l.unit === "m²");
    expect(glass?.quantityMilli).toBe(4330);
    expect(lines.some((l) => l.group === "aquascape_materials")).toBe(true);

    const bad: [Record<string, unknown>, string][] = [
      [line({ unitPriceMinor: -100 }), "lines.0.unitPriceMinor"],
      [line({ quantityMilli: -1 }), "lines.0.quantityMilli"],
      [line({ taxBp: 10_001 }), "lines.0.taxBp"],
      [line({ quantityMilli: 1_000_000_000, unitPriceMinor: 10_000_000_000 }), "_"],
      [line({ unitPriceMinor: 1e16 }), "lines.0.unitPriceMinor"],
    ];
    for (const [l, field] of bad) {
      const res = await lead.request("PUT", `/api/projects/${t.project.id}/quotes/${draft.id}`, { lines: [l], notes: "" });
      expect(res.status, JSON.stringify(l)).toBe(400);
      expect(res.json.error).toBeTruthy();
      if (field !== "_") expect(res.json.fields[field]).toBeTruthy();
      else expect(res.json.error).toContain("too large");
    }
    expect(await db().select().from(quoteLines).where(eq(quoteLines.quoteId, draft.id))).toHaveLength(lines.length);

    const saved = await lead.request("PUT", `/api/projects/${t.project.id}/quotes/${draft.id}`, { lines: [line(), line({ group: "lighting", description: "Light rail", unit: "each", quantityMilli: 1000, unitPriceMinor: 38_500 })], notes: "Delivery included." });
    expect(saved.status).toBe(200);
    // 8 × 95.00 = 760.00 + 385.00 = 1,145.00 before tax; 20 % = 229.00; 1,374.00 in all.
    expect(saved.json).toEqual({ netMinor: 114_500, taxMinor: 22_900, totalMinor: 137_400 });
    expect((await lead.post(`/api/projects/${t.project.id}/quotes`, { from: "design" })).status).toBe(409);
    expect((await lead.post(`/api/projects/${t.project.id}/quotes/${draft.id}/issue`)).status).toBe(200);
    expect((await lead.request("PUT", `/api/projects/${t.project.id}/quotes/${draft.id}`, { lines: [line()], notes: "" })).status).toBe(409);
    const rows = await db().select().from(quotes).where(eq(quotes.projectId, t.project.id));
    expect(rows.map((r) => r.status)).toEqual(["current"]);
  });

  it("only the lead prices and quotes; the client sees the current version; crew and strangers don't", async () => {
    const t = await makeTeam("stand_load_check");
    const lead = await signedIn(t.lead);
    await draftFromDesign(t, lead);
    const [crew, client, otherClient, otherCrew] = await Promise.all([signedIn(t.crew), signedIn(t.client), signedIn(t.otherClient), signedIn(t.otherCrew)]);
    expect((await crew.post(`/api/projects/${t.project.id}/quotes`, { from: "design" })).status).toBe(403);
    expect((await crew.get(`/api/projects/${t.project.id}/quotes`)).status).toBe(403);
    expect((await otherCrew.get(`/api/projects/${t.project.id}/quotes`)).status).toBe(404);
    expect((await otherClient.get(`/api/projects/${t.project.id}/quotes`)).status).toBe(404);
    expect((await anonymous().get(`/api/projects/${t.project.id}/quotes`)).status).toBe(401);
    expect((await client.post(`/api/projects/${t.project.id}/quotes`, { from: "design" })).status).toBe(403);
    const own = await client.get(`/api/projects/${t.project.id}/quotes`);
    expect(own.status).toBe(200);
    expect(own.json.current).toBeNull();
    expect(own.json.versions).toBeUndefined();
    for (const s of [crew, client]) {
      expect((await s.get(`/api/price-list`)).status).toBe(403);
      expect((await s.post(`/api/price-list`, { group: "labour", label: "Sneaky", unit: "each", unitPriceMinor: 1, taxBp: 0, basis: "manual" })).status).toBe(403);
    }
    expect((await anonymous().get(`/api/price-list`)).status).toBe(401);
    expect((await lead.post(`/api/price-list`, { group: "labour", label: "Negative", unit: "each", unitPriceMinor: -5, taxBp: 0, basis: "manual" })).status).toBe(400);
    expect((await lead.post(`/api/price-list`, { group: "labour", label: "Taxing", unit: "each", unitPriceMinor: 5, taxBp: 12_000, basis: "manual" })).status).toBe(400);
    expect((await crew.get(`/projects/${t.project.id}/money`)).status).toBe(404);
  });

  it("the client accepts the current version by typed name, storing who, when, where and the hash of what they saw; a later version needs a new acceptance", async () => {
    const t = await makeTeam("stand_load_check");
    const lead = await signedIn(t.lead);
    const v1 = await draftFromDesign(t, lead);
    await lead.request("PUT", `/api/projects/${t.project.id}/quotes/${v1.id}`, { lines: [line()], notes: "" });
    await lead.post(`/api/projects/${t.project.id}/quotes/${v1.id}/issue`);
    const client = await signedIn(t.client);
    const seen = (await client.get(`/api/projects/${t.project.id}/quotes`)).json.current;
    const accept = (s: Session, quoteId: string, body: Record<string, unknown>) =>
      s.request("POST", `/api/projects/${t.project.id}/quotes/${quoteId}/accept`, body, { headers: { "x-forwarded-for": "203.0.113.7, 10.0.0.1" } });

    expect((await accept(client, v1.id, { typedName: "Someone Else", seenHash: seen.hash })).status).toBe(422);
    expect((await accept(client, v1.id, { typedName: t.client.name, seenHash: "a".repeat(64) })).status).toBe(409);
    expect((await accept(lead, v1.id, { typedName: t.lead.name, seenHash: seen.hash })).status).toBe(403);
    expect((await accept(await signedIn(t.crew), v1.id, { typedName: t.crew.name, seenHash: seen.hash })).status).toBe(403);
    expect((await accept(await signedIn(t.otherClient), v1.id, { typedName: t.otherClient.name, seenHash: seen.hash })).status).toBe(404);
    expect(await db().select().from(quoteAcceptances).where(eq(quoteAcceptances.projectId, t.project.id))).toHaveLength(0);
    expect(await invoicesOf(t.project)).toHaveLength(0);

    const ok = await accept(client, v1.id, { typedName: `  ${t.client.name.toUpperCase()} `, seenHash: seen.hash });
    expect(ok.status).toBe(201);
    const [stored] = await db().select().from(quoteAcceptances).where(eq(quoteAcceptances.projectId, t.project.id));
    expect(stored).toMatchObject({ quoteId: v1.id, acceptedBy: t.client.id, ipAddress: "203.0.113.7", contentHash: seen.hash, totalMinor: 91_200 });
    expect(Date.now() - stored.acceptedAt.getTime()).toBeLessThan(60_000);
    // 8 × 95.00 + 20 % = 912.00; the company default deposit is 50 %: 456.00.
    const [deposit] = await invoicesOf(t.project);
    expect(deposit).toMatchObject({ kind: "deposit", totalMinor: 45_600, taxMinor: 7600, status: "open" });
    expect((await accept(client, v1.id, { typedName: t.client.name, seenHash: seen.hash })).status).toBe(409);

    const v2 = (await lead.post(`/api/projects/${t.project.id}/quotes`, { from: "current" })).json.quote;
    await lead.request("PUT", `/api/projects/${t.project.id}/quotes/${v2.id}`, { lines: [line({ quantityMilli: 10_000 })], notes: "Two more hours." });
    await lead.post(`/api/projects/${t.project.id}/quotes/${v2.id}/issue`);
    const after = (await client.get(`/api/projects/${t.project.id}/quotes`)).json.current;
    expect(after.view.version).toBe(2);
    expect(after.acceptance).toBeNull();
    const superseded = await accept(client, v1.id, { typedName: t.client.name, seenHash: seen.hash });
    expect(superseded.status).toBe(409);
    expect(superseded.json.error).toContain("replaced by version 2");
    expect(await db().select().from(quoteAcceptances).where(eq(quoteAcceptances.projectId, t.project.id))).toHaveLength(1);
    expect((await accept(client, v2.id, { typedName: t.client.name, seenHash: after.hash })).status).toBe(201);
    expect(await db().select().from(quoteAcceptances).where(eq(quoteAcceptances.projectId, t.project.id))).toHaveLength(2);
    expect((await invoicesOf(t.project)).filter((i) => i.kind === "deposit")).toHaveLength(1);
  });
});
