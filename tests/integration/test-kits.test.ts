import { describe, expect, it } from "vitest";
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { projectTestKits, testKits } from "@/db/schema";
import { makeTeam } from "../support/fixtures";
import { anonymous, signedIn } from "../support/http";

const kit = (over: Record<string, unknown> = {}) => ({ name: `Kit ${randomUUID().slice(0, 6)}`, analyte: "ammonia", basis: "compound", steps: "0, 1, 2, 4", ...over });

describe("company test kits", () => {
  it("are the lead's to describe; crew, clients and strangers change nothing", async () => {
    const t = await makeTeam();
    const before = (await db().select().from(testKits)).length;
    expect((await anonymous().request("POST", "/api/settings/test-kits", kit())).status).toBe(401);
    for (const who of [t.crew, t.client]) {
      const s = await signedIn(who);
      expect((await s.request("POST", "/api/settings/test-kits", kit())).status).toBe(403);
    }
    expect((await db().select().from(testKits)).length).toBe(before);
    const lead = await signedIn(t.lead);
    const made = await lead.request("POST", "/api/settings/test-kits", kit({ name: "  Bench nitrite  ", analyte: "nitrite", basis: "nitrogen", steps: "0, 0.1, 0.2" }));
    expect(made.status).toBe(201);
    expect(made.json.kit).toMatchObject({ name: "Bench nitrite", analyte: "nitrite", basis: "nitrogen", steps: [0, 0.1, 0.2] });
    const page = await lead.get("/settings");
    expect(page.text).toContain("Bench nitrite");
  });

  it("refuses bad steps and names field by field, saving nothing", async () => {
    const t = await makeTeam();
    const lead = await signedIn(t.lead);
    const before = (await db().select().from(testKits)).length;
    const cases: [Record<string, unknown>, string, RegExp][] = [
      [kit({ steps: "1, 2" }), "steps", /Start the steps at 0/],
      [kit({ steps: "0, 2, 1" }), "steps", /lowest to highest/],
      [kit({ steps: "0, lots" }), "steps", /number from 0 to 500/],
      [kit({ name: "" }), "name", /name/],
    ];
    for (const [body, field, message] of cases) {
      const res = await lead.request("POST", "/api/settings/test-kits", body);
      expect(res.status).toBe(400);
      expect(res.json.fields[field]).toMatch(message);
    }
    const wrongAnalyte = await lead.request("POST", "/api/settings/test-kits", kit({ analyte: "phosphate" }));
    expect(wrongAnalyte.status).toBe(400);
    expect((await lead.request("POST", "/api/settings/test-kits", "not json", { headers: { "content-type": "application/json" } })).status).toBe(400);
    expect((await db().select().from(testKits)).length).toBe(before);
  });

  it("are chosen per project by the lead, offered on the water page, and fall back to the neutral steps when retired", async () => {
    const t = await makeTeam("cycling");
    const lead = await signedIn(t.lead);
    const made = await lead.request("POST", "/api/settings/test-kits", kit({ name: "Cellar ammonia case", steps: "0, 0.3, 0.6, 1.2" }));
    const kitId = made.json.kit.id as string;
    const url = `/api/projects/${t.project.id}/test-kits`;

    const crew = await signedIn(t.crew);
    expect((await crew.request("PUT", url, { analyte: "ammonia", kitId })).status).toBe(403);
    expect((await lead.request("PUT", url, { analyte: "nitrate", kitId })).status).toBe(422);
    expect((await lead.request("PUT", url, { analyte: "ammonia", kitId: randomUUID() })).status).toBe(404);
    expect((await lead.request("PUT", url, { analyte: "ammonia", kitId: "nope" })).status).toBe(400);
    expect(await db().select().from(projectTestKits).where(eq(projectTestKits.projectId, t.project.id))).toHaveLength(0);

    const chosen = await lead.request("PUT", url, { analyte: "ammonia", kitId });
    expect(chosen.status).toBe(200);
    expect(chosen.json.kits.ammonia.name).toBe("Cellar ammonia case");
    expect(chosen.json.kits.nitrite.id).toBeNull();
    const water = await crew.get(`/projects/${t.project.id}/water`);
    expect(water.text).toContain("Cellar ammonia case");
    expect(water.text).toContain("Ammonia 0.6 mg/L total ammonia");

    expect((await crew.request("POST", `/api/settings/test-kits/${kitId}/retire`)).status).toBe(403);
    expect((await lead.request("POST", `/api/settings/test-kits/${kitId}/retire`)).status).toBe(200);
    expect((await lead.request("POST", `/api/settings/test-kits/${kitId}/retire`)).status).toBe(404);
    const after = await crew.get(url);
    expect(after.json.kits.ammonia.id).toBeNull();
    expect(after.json.kits.ammonia.steps).toEqual([0, 0.5, 1, 1.5, 2, 2.5, 3, 3.5, 4]);
    expect((await lead.request("PUT", url, { analyte: "ammonia", kitId })).status).toBe(404);
  });
});
