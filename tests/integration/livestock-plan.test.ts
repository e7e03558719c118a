import { describe, expect, it } from "vitest";
import { makeTeam, getProject } from "../support/fixtures";
import { signedIn } from "../support/http";
import { cycled, daysAgo, fishRows, giveDesign, makeHoldingTank, speciesIds } from "./livestock-support";
import { insertReadings } from "./water-support";

const plan = (id: string) => `/api/projects/${id}/stocking-plan`;

describe("the stocking plan", () => {
  it("lets the lead plan batches in order, crew read them, and puts the checks and the caution beside them", async () => {
    const t = await makeTeam("cycling");
    await giveDesign(t.project, t.lead);
    const sp = await speciesIds("Neon tetra", "Red zebra cichlid", "Oscar");
    const lead = await signedIn(t.lead);
    const first = await lead.post(`${plan(t.project.id)}/batches`, { items: [{ speciesId: sp["Neon tetra"], count: 4 }] });
    expect(first.status).toBe(201);
    expect(first.json.batch.position).toBe(1);
    const second = await lead.post(`${plan(t.project.id)}/batches`, { items: [{ speciesId: sp["Red zebra cichlid"], count: 1 }, { speciesId: sp["Oscar"], count: 1 }], note: "Big fish last" });
    expect(second.json.batch.position).toBe(2);

    const crew = await signedIn(t.crew);
    const view = await crew.get(plan(t.project.id));
    expect(view.status).toBe(200);
    expect(view.json.batches.map((b: { position: number; status: string }) => [b.position, b.status])).toEqual([
      [1, "planned"],
      [2, "planned"],
    ]);
    const rules = view.json.warnings.map((w: { rule: string }) => w.rule);
    // Neon (4 of 6), an aggressive cichlid with a peaceful tetra, an oscar that can swallow a neon, hard-water cichlid vs soft-water tetra.
    expect(rules).toEqual(expect.arrayContaining(["shoaling", "temperament", "predation", "ph"]));
    expect(view.json.warnings.find((w: { rule: string }) => w.rule === "shoaling").message).toBe("Neon tetra is kept in groups of 6 or more; the plan has 4.");
    expect(view.json.bioload.rule).toContain("rough guide");
    expect(view.json.caution).toMatch(/rules of thumb.*individual fish differ.*lead's judgement decides/);

    // Crew views but doesn't plan; the client doesn't see the plan; another crew member doesn't see the project.
    expect((await crew.post(`${plan(t.project.id)}/batches`, { items: [{ speciesId: sp["Oscar"], count: 1 }] })).status).toBe(403);
    expect((await (await signedIn(t.client)).get(plan(t.project.id))).status).toBe(403);
    expect((await (await signedIn(t.otherCrew)).get(plan(t.project.id))).status).toBe(404);
  });

  it("refuses unknown species and counts of zero or below with field messages, saving nothing", async () => {
    const t = await makeTeam("cycling");
    const sp = await speciesIds("Neon tetra");
    const lead = await signedIn(t.lead);
    const unknown = await lead.post(`${plan(t.project.id)}/batches`, {
      items: [
        { speciesId: sp["Neon tetra"], count: 6 },
        { speciesId: "5b0e7f0c-2f7e-4d55-9c1a-0d1f2e3a4b5c", count: 2 },
      ],
    });
    expect(unknown.status).toBe(400);
    expect(unknown.json.fields["items.1.speciesId"]).toBe("That species isn't in the catalogue.");
    const zero = await lead.post(`${plan(t.project.id)}/batches`, { items: [{ speciesId: sp["Neon tetra"], count: 0 }] });
    expect(zero.status).toBe(400);
    expect(zero.json.fields["items.0.count"]).toBe("At least one fish.");
    const negative = await lead.post(`${plan(t.project.id)}/batches`, { items: [{ speciesId: sp["Neon tetra"], count: -3 }] });
    expect(negative.status).toBe(400);
    const empty = await lead.post(`${plan(t.project.id)}/batches`, { items: [] });
    expect(empty.json.fields.items).toBe("Add at least one species.");
    expect((await fishRows(t.project.id)).planned).toBe(0);
  });
});

describe("quarantine before the display", () => {
  it("holds a batch until its quarantine has run, unless the lead overrides in writing; then the census and the in-service gate follow", async () => {
    const t = await makeTeam("first_stocking");
    await cycled(t.project, t.crew);
    const sp = await speciesIds("Harlequin rasbora");
    const holding = await makeHoldingTank();
    const lead = await signedIn(t.lead);
    const crew = await signedIn(t.crew);
    const { json } = await lead.post(`${plan(t.project.id)}/batches`, { items: [{ speciesId: sp["Harlequin rasbora"], count: 8 }] });
    const batchUrl = `${plan(t.project.id)}/batches/${json.batch.id}`;

    // Not quarantined at all.
    let res = await crew.post(`${batchUrl}/display`, {});
    expect(res.status).toBe(422);
    expect(res.json.fields.addedAt).toMatch(/hasn't been through quarantine/);

    // A start date in the future is refused; a real start begins the period.
    res = await crew.post(`${batchUrl}/quarantine`, { holdingTankId: holding.id, startedAt: new Date(Date.now() + 3 * 86_400_000).toISOString() });
    expect(res.status).toBe(400);
    expect(res.json.fields.startedAt).toMatch(/future/);
    res = await crew.post(`${batchUrl}/quarantine`, { holdingTankId: holding.id, startedAt: daysAgo(3) });
    expect(res.status).toBe(201);
    expect(res.json.batch.quarantineDays).toBe(28);
    expect((await crew.post(`${batchUrl}/quarantine-notes`, { kind: "observation", text: "All eating, fins clear" })).status).toBe(201);
    expect((await crew.post(`${batchUrl}/quarantine-notes`, { kind: "treatment", text: "Salt bath for one with a white spot", at: daysAgo(1) })).status).toBe(201);

    // Before the period ends: refused, nothing saved, and the board says how long is left.
    res = await crew.post(`${batchUrl}/display`, {});
    expect(res.status).toBe(422);
    expect(res.json.error).toMatch(/Quarantine runs 28 days; 25 days are left/);
    expect(res.json.canOverride).toBe(false);
    expect(await fishRows(t.project.id)).toEqual({ batches: 0, groups: 0, events: 0, planned: 1 });
    const { getBoard } = await import("@/db/queries/board");
    const card = (await getBoard(t.lead)).cards.find((c) => c.id === t.project.id)!;
    expect(card.quarantineDaysLeft).toBe(25);
    expect(card.nextNeeds).toEqual(["The first batch is in quarantine: 25 days left."]);

    // Crew can't override; the lead can, with a reason.
    expect((await crew.post(`${batchUrl}/override`, { reason: "Fish came from our own system" })).status).toBe(403);
    expect((await lead.post(`${batchUrl}/override`, { reason: "" })).status).toBe(400);
    expect((await lead.post(`${batchUrl}/override`, { reason: "Same supplier batch already three weeks clean in our rack" })).status).toBe(200);
    res = await crew.post(`${batchUrl}/display`, {});
    expect(res.status).toBe(201);
    expect(res.json.fishCount).toBe(8);

    const record = await crew.get(`/api/projects/${t.project.id}/livestock`);
    expect(record.json.groups).toHaveLength(1);
    expect(record.json.groups[0].census).toEqual({ display: 8, holding: 0 });
    expect(record.json.groups[0].source).toMatch(/released early by the lead/);
    expect((await crew.post(`${batchUrl}/display`, {})).status).toBe(409);

    // The gate into in service reads the plan's first batch.
    const p = await getProject(t.project.id);
    const move = await crew.post(`/api/projects/${t.project.id}/move`, { toStage: "in_service", version: p.version });
    expect(move.status).toBe(200);
  });

  it("lets a batch in once its period has run, but only when the water has re-tested at zero since the last batch", async () => {
    const t = await makeTeam("first_stocking");
    await cycled(t.project, t.crew);
    const sp = await speciesIds("Bronze corydoras", "Pearl gourami");
    const holding = await makeHoldingTank();
    const lead = await signedIn(t.lead);
    const crew = await signedIn(t.crew);
    const b1 = (await lead.post(`${plan(t.project.id)}/batches`, { items: [{ speciesId: sp["Bronze corydoras"], count: 6 }] })).json.batch.id;
    const b2 = (await lead.post(`${plan(t.project.id)}/batches`, { items: [{ speciesId: sp["Pearl gourami"], count: 1 }] })).json.batch.id;
    for (const b of [b1, b2]) expect((await crew.post(`${plan(t.project.id)}/batches/${b}/quarantine`, { holdingTankId: holding.id, startedAt: daysAgo(30) })).status).toBe(201);

    expect((await crew.post(`${plan(t.project.id)}/batches/${b1}/display`, { addedAt: daysAgo(0.05) })).status).toBe(201);
    // Straight after: no test since the first batch went in.
    const refused = await crew.post(`${plan(t.project.id)}/batches/${b2}/display`, {});
    expect(refused.status).toBe(422);
    expect(refused.json.error).toMatch(/next batch has to wait/);
    expect(await fishRows(t.project.id)).toMatchObject({ batches: 1, groups: 1 });

    await insertReadings(t.project.id, t.crew.id, [{ hoursAgo: 0.5, ammonia: 0, nitrite: 0, nitrate: 20 }]);
    expect((await crew.post(`${plan(t.project.id)}/batches/${b2}/display`, {})).status).toBe(201);
    expect(await fishRows(t.project.id)).toMatchObject({ batches: 2, groups: 2 });
  });

  it("keeps the company's quarantine period as a lead-only setting", async () => {
    const t = await makeTeam("site_survey");
    const lead = await signedIn(t.lead);
    expect((await (await signedIn(t.crew)).request("PUT", "/api/settings/quarantine", { quarantineDays: 10 })).status).toBe(403);
    const bad = await lead.request("PUT", "/api/settings/quarantine", { quarantineDays: -1 });
    expect(bad.status).toBe(400);
    expect(bad.json.fields.quarantineDays).toBe("The period can't be negative.");
    expect((await lead.request("PUT", "/api/settings/quarantine", { quarantineDays: 35 })).status).toBe(200);
    expect((await lead.get("/api/settings/quarantine")).json.quarantineDays).toBe(35);
    expect((await lead.request("PUT", "/api/settings/quarantine", { quarantineDays: 28 })).status).toBe(200);
  });
});
