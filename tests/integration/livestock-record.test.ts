import { describe, expect, it } from "vitest";
import { makeProject, makeTeam, makeUser } from "../support/fixtures";
import { signedIn } from "../support/http";
import { cycled, daysAgo, fishRows, makeHoldingTank, speciesIds } from "./livestock-support";

/** A tank in service with one group of 10 rasboras added 20 days ago through the plan. */
async function stockedTank() {
  const t = await makeTeam("first_stocking");
  await cycled(t.project, t.crew);
  const sp = await speciesIds("Harlequin rasbora");
  const holding = await makeHoldingTank();
  const lead = await signedIn(t.lead);
  const url = `/api/projects/${t.project.id}/stocking-plan/batches`;
  const batch = (await lead.post(url, { items: [{ speciesId: sp["Harlequin rasbora"], count: 10 }] })).json.batch.id;
  expect((await lead.post(`${url}/${batch}/quarantine`, { holdingTankId: holding.id, startedAt: daysAgo(50) })).status).toBe(201);
  expect((await lead.post(`${url}/${batch}/display`, { addedAt: daysAgo(0.1) })).status).toBe(201);
  const crew = await signedIn(t.crew);
  const groupId = (await crew.get(`/api/projects/${t.project.id}/livestock`)).json.groups[0].id as string;
  return { t, crew, lead, holding, groupId };
}

describe("the livestock record", () => {
  it("keeps the census right after every kind of event", async () => {
    const { t, crew, holding, groupId } = await stockedTank();
    const events = `/api/projects/${t.project.id}/livestock/events`;
    const census = async () => (await crew.get(`/api/projects/${t.project.id}/livestock`)).json.groups[0].census;
    expect(await census()).toEqual({ display: 10, holding: 0 });

    const steps: [Record<string, unknown>, { display: number; holding: number }][] = [
      [{ kind: "lost", count: 1, cause: "Jumped; found on the floor" }, { display: 9, holding: 0 }],
      [{ kind: "to_holding", count: 3, holdingTankId: holding.id, note: "Chased by the others" }, { display: 6, holding: 3 }],
      [{ kind: "from_holding", count: 1, holdingTankId: holding.id }, { display: 7, holding: 2 }],
      [{ kind: "rehomed", count: 1, place: "holding" }, { display: 7, holding: 1 }],
      [{ kind: "lost", count: 1, place: "holding", cause: "Unknown" }, { display: 7, holding: 0 }],
      [{ kind: "rehomed", count: 2 }, { display: 5, holding: 0 }],
      [{ kind: "measured", lengthMm: 31 }, { display: 5, holding: 0 }],
      [{ kind: "behaviour", note: "Two chasing each other at feeding; no fin damage" }, { display: 5, holding: 0 }],
    ];
    for (const [body, expected] of steps) {
      const res = await crew.post(events, { groupId, ...body });
      expect(res.status, JSON.stringify(res.json)).toBe(201);
      expect(res.json.census).toEqual(expected);
      expect(await census()).toEqual(expected);
    }
    const record = await crew.get(`/api/projects/${t.project.id}/livestock`);
    expect(record.json.groups[0].growth.map((g: { lengthMm: number }) => g.lengthMm)).toEqual([31]);
    expect(record.json.history.map((h: { kind: string }) => h.kind)).toEqual(expect.arrayContaining(["added", "lost", "to_holding", "from_holding", "rehomed", "measured", "behaviour"]));
  });

  it("refuses bad events with field messages and saves nothing", async () => {
    const { t, crew, holding, groupId } = await stockedTank();
    const events = `/api/projects/${t.project.id}/livestock/events`;
    const before = await fishRows(t.project.id);

    let res = await crew.post(events, { groupId, kind: "to_holding", count: 11, holdingTankId: holding.id });
    expect(res.status).toBe(400);
    expect(res.json.fields.count).toBe("Only 10 fish are in the display; you can't move or remove 11.");
    res = await crew.post(events, { groupId, kind: "lost", count: 0, cause: "x" });
    expect(res.json.fields.count).toBe("Enter how many fish, one or more.");
    res = await crew.post(events, { groupId, kind: "lost", count: 1 });
    expect(res.json.fields.cause).toMatch(/what the fish died of/);
    res = await crew.post(events, { groupId, kind: "measured", lengthMm: 30, at: new Date(Date.now() + 2 * 86_400_000).toISOString() });
    expect(res.status).toBe(400);
    expect(res.json.fields.at).toMatch(/future/);
    res = await crew.post(events, { groupId, kind: "to_holding", count: 1 });
    expect(res.json.fields.holdingTankId).toBeTruthy();
    res = await crew.post(events, { groupId, kind: "added", count: 5 });
    expect(res.status).toBe(400);
    expect(res.json.fields.kind).toBeTruthy();
    res = await crew.post(events, { groupId: "5b0e7f0c-2f7e-4d55-9c1a-0d1f2e3a4b5c", kind: "measured", lengthMm: 30 });
    expect(res.json.fields.groupId).toBeTruthy();
    res = await crew.post(events, { groupId, kind: "measured", lengthMm: 30, at: daysAgo(10) });
    expect(res.json.fields.at).toBe("That is before these fish were added.");

    expect(await fishRows(t.project.id)).toEqual(before);
  });

  it("shows a client only their own tanks, read-only, and keeps other crew out", async () => {
    const { t, groupId } = await stockedTank();
    const client = await signedIn(t.client);
    const own = await client.get(`/api/projects/${t.project.id}/livestock`);
    expect(own.status).toBe(200);
    expect(own.json.groups[0].census.display).toBe(10);
    expect((await client.post(`/api/projects/${t.project.id}/livestock/events`, { groupId, kind: "measured", lengthMm: 30 })).status).toBe(403);

    // The same client's second tank is theirs too; another client's tank is not.
    const second = await makeProject({ client: t.client, lead: t.lead, stage: "in_service" });
    expect((await client.get(`/api/projects/${second.id}/livestock`)).status).toBe(200);
    const stranger = await makeUser("client");
    const theirs = await makeProject({ client: stranger, lead: t.lead, stage: "in_service" });
    expect((await client.get(`/api/projects/${theirs.id}/livestock`)).status).toBe(404);
    expect((await (await signedIn(t.otherClient)).get(`/api/projects/${t.project.id}/livestock`)).status).toBe(404);
    expect((await (await signedIn(t.otherCrew)).get(`/api/projects/${t.project.id}/livestock`)).status).toBe(404);
    const page = await client.get(`/projects/${t.project.id}/fish`);
    expect(page.status).toBe(200);
    expect(page.text).toContain("Harlequin rasbora: 10 fish in your tank.");
    expect(page.text).not.toContain("Stocking plan");
  });
});

describe("the species catalogue", () => {
  it("is the lead's to edit, checked like any other input", async () => {
    const t = await makeTeam("site_survey");
    const lead = await signedIn(t.lead);
    const body = {
      commonName: "Lemon tetra",
      scientificName: "Hyphessobrycon pulchripinnis",
      water: "fresh",
      tempMinC: 23,
      tempMaxC: 28,
      phMin: 5.5,
      phMax: 7.5,
      adultLengthMm: 50,
      temperament: "peaceful",
      territorial: false,
      shoalMin: 6,
      level: "middle",
      coralSafe: true,
      invertSafe: null,
      diet: "omnivore",
      minTankLengthMm: null,
      notes: "A yellow group fish; glows against dark plants.",
      source: "from memory",
    };
    expect((await (await signedIn(t.crew)).post("/api/species", body)).status).toBe(403);
    const bad = await lead.post("/api/species", { ...body, tempMinC: 30, scientificName: "lemon tetra" });
    expect(bad.status).toBe(400);
    expect(bad.json.fields.tempMaxC).toBe("The highest temperature is below the lowest.");
    expect(bad.json.fields.scientificName).toBeTruthy();
    const made = await lead.post("/api/species", body);
    expect(made.status).toBe(201);
    expect(made.json.species.coralSafe).toBeNull();
    expect((await lead.post("/api/species", body)).status).toBe(409);
    const edited = await lead.request("PUT", `/api/species/${made.json.species.id}`, { ...body, adultLengthMm: 55 });
    expect(edited.json.species.adultLengthMm).toBe(55);
    expect((await (await signedIn(t.crew)).get("/api/species")).json.species.length).toBeGreaterThan(120);
  });
});
