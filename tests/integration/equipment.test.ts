import { describe, expect, it } from "vitest";
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { company, equipment, equipmentServices } from "@/db/schema";
import { makeTeam } from "../support/fixtures";
import { anonymous, signedIn } from "../support/http";
import { dbDigest } from "../support/db-digest";
import { addDays, dateWords, localDay } from "@/lib/service/local-dates";

const piece = (over: Record<string, unknown> = {}) => ({ kind: "canister filter", makeModel: "Canister 700 (house brand)", installedOn: "2026-01-05", warrantyUntil: "2028-01-05", serviceIntervalDays: "", lastServicedOn: "", notes: "", ...over });
const today = () => localDay(new Date(), "UTC"); // the test company works in UTC (the column's default)

describe("the equipment register", () => {
  it("is added to and changed by the lead and the assigned crew, read by the client without notes, and hidden from everyone else", async () => {
    const t = await makeTeam("in_service");
    const url = `/api/projects/${t.project.id}/equipment`;
    const [lead, crew, client, otherCrew, otherClient] = await Promise.all([signedIn(t.lead), signedIn(t.crew), signedIn(t.client), signedIn(t.otherCrew), signedIn(t.otherClient)]);
    const before = await dbDigest();
    expect((await anonymous().request("POST", url, piece())).status).toBe(401);
    expect((await client.request("POST", url, piece())).status).toBe(403);
    expect((await otherCrew.request("POST", url, piece())).status).toBe(404);
    expect((await otherClient.get(url)).status).toBe(404);
    expect(await dbDigest()).toEqual(before);

    const added = await crew.request("POST", url, piece({ makeModel: "  Canister 700 (house brand) ", notes: "Spare O-ring in the cabinet", serviceIntervalDays: "90" }));
    expect(added.status).toBe(201);
    expect(added.json.piece).toMatchObject({ kind: "canister filter", makeModel: "Canister 700 (house brand)", serviceIntervalDays: 90, notes: "Spare O-ring in the cabinet", lastServicedAt: null });
    const heater = await lead.request("POST", url, piece({ kind: "heater", makeModel: "Heater 200 W (house brand)", lastServicedOn: "2026-03-01" }));
    expect(heater.status).toBe(201);
    expect(heater.json.piece.lastServicedAt).toBe("2026-03-01T12:00:00.000Z"); // noon in the company's zone (UTC)

    const changed = await crew.request("PATCH", `${url}/${added.json.piece.id}`, piece({ makeModel: "Canister 750 (house brand)", serviceIntervalDays: 60, notes: "Spare O-ring in the cabinet" }));
    expect(changed.status).toBe(200);
    expect(changed.json.piece).toMatchObject({ makeModel: "Canister 750 (house brand)", serviceIntervalDays: 60 });

    const read = await client.get(url);
    expect(read.status).toBe(200);
    expect(read.json.equipment.map((p: { makeModel: string }) => p.makeModel).sort()).toEqual(["Canister 750 (house brand)", "Heater 200 W (house brand)"]);
    expect(read.json.equipment.every((p: { notes: string | null }) => p.notes === null)).toBe(true);
    const clientPage = await client.get(`/projects/${t.project.id}/equipment`);
    expect(clientPage.status).toBe(200);
    expect(clientPage.text).toContain("Canister 750 (house brand)");
    expect(clientPage.text).not.toContain("Spare O-ring");
    expect(clientPage.text).not.toContain("Record a service");
    const crewPage = await crew.get(`/projects/${t.project.id}/equipment`);
    expect(crewPage.text).toContain("Spare O-ring");
    expect(crewPage.text).toContain("licensed electrician");
    expect((await otherCrew.get(`/projects/${t.project.id}/equipment`)).status).toBe(404);
  });

  it("retires a piece with a reason and a name; a retired piece can't be changed and leaves the client's list", async () => {
    const t = await makeTeam("in_service");
    const url = `/api/projects/${t.project.id}/equipment`;
    const [lead, crew, client] = await Promise.all([signedIn(t.lead), signedIn(t.crew), signedIn(t.client)]);
    const id = (await lead.request("POST", url, piece({ kind: "lighting", makeModel: "LED bar 90 cm (house brand)" }))).json.piece.id as string;
    expect((await client.request("POST", `${url}/${id}/retire`, { reason: "replaced" })).status).toBe(403);
    expect((await crew.request("POST", `${url}/${id}/retire`, { reason: "" })).status).toBe(400);
    const retired = await crew.request("POST", `${url}/${id}/retire`, { reason: "Replaced with a longer bar" });
    expect(retired.status).toBe(200);
    const [row] = await db().select().from(equipment).where(eq(equipment.id, id));
    expect(row).toMatchObject({ retiredBy: t.crew.id, retireReason: "Replaced with a longer bar" });
    expect(row.retiredAt).not.toBeNull();
    expect((await crew.request("POST", `${url}/${id}/retire`, { reason: "again" })).status).toBe(404);
    expect((await lead.request("PATCH", `${url}/${id}`, piece({ kind: "lighting" }))).status).toBe(404);
    expect((await lead.request("POST", `${url}/${id}/services`, { servicedOn: today(), clientKey: randomUUID() })).status).toBe(404);
    expect((await client.get(url)).json.equipment).toEqual([]);
    const leadPage = await lead.get(`/projects/${t.project.id}/equipment`);
    expect(leadPage.text).toContain("Replaced with a longer bar");
  });

  it("refuses bad input with a message naming the field, and changes nothing", async () => {
    const t = await makeTeam("in_service");
    const url = `/api/projects/${t.project.id}/equipment`;
    const lead = await signedIn(t.lead);
    const id = (await lead.request("POST", url, piece())).json.piece.id as string;
    const before = await dbDigest();
    const cases: [Record<string, unknown>, string, RegExp][] = [
      [piece({ installedOn: "2026-05-01", warrantyUntil: "2026-04-30" }), "warrantyUntil", /warranty can't end before the piece was installed/],
      [piece({ installedOn: "2026-02-30" }), "installedOn", /install date as a date/],
      [piece({ warrantyUntil: "next spring" }), "warrantyUntil", /as a date/],
      [piece({ installedOn: 20260105 }), "installedOn", /as a date/],
      [piece({ serviceIntervalDays: 0 }), "serviceIntervalDays", /at least 1 day/],
      [piece({ serviceIntervalDays: 3651 }), "serviceIntervalDays", /3650 days/],
      [piece({ serviceIntervalDays: 1.5 }), "serviceIntervalDays", /whole days/],
      [piece({ serviceIntervalDays: "often" }), "serviceIntervalDays", /whole days \(1 to 3650\)/],
      [piece({ kind: "toaster" }), "kind", /Choose what kind/],
      [piece({ lastServicedOn: addDays(today(), 2) }), "lastServicedOn", /can't be in the future/],
      [piece({ installedOn: "2026-01-05", lastServicedOn: "2025-12-01" }), "lastServicedOn", /before the piece was installed/],
      [piece({ makeModel: "x".repeat(201) }), "makeModel", /under 200/],
    ];
    for (const [body, field, message] of cases) {
      const res = await lead.request("POST", url, body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(res.json.fields[field], field).toMatch(message);
    }
    const patch = await lead.request("PATCH", `${url}/${id}`, piece({ installedOn: "2026-05-01", warrantyUntil: "2026-04-01" }));
    expect(patch.status).toBe(400);
    expect(patch.json.fields.warrantyUntil).toMatch(/before the piece was installed/);
    expect((await lead.request("PATCH", `${url}/not-an-id`, piece())).status).toBe(404);
    expect((await lead.request("PATCH", `${url}/${randomUUID()}`, piece())).status).toBe(404);
    expect(await dbDigest()).toEqual(before);
  });

  it("records a service by hand once per save, resets the next due date, and never moves it back", async () => {
    const t = await makeTeam("in_service");
    const url = `/api/projects/${t.project.id}/equipment`;
    const [crew, client] = await Promise.all([signedIn(t.crew), signedIn(t.client)]);
    const installedOn = addDays(today(), -100);
    const id = (await crew.request("POST", url, piece({ installedOn, warrantyUntil: "", serviceIntervalDays: 30 }))).json.piece.id as string;
    const page = async () => (await crew.get(`/projects/${t.project.id}/equipment`)).text;
    // Never serviced: due 30 days after the install, so 70 days overdue.
    expect(await page()).toContain("overdue by 70 days");

    const servicedOn = addDays(today(), -2);
    const key = randomUUID();
    expect((await client.request("POST", `${url}/${id}/services`, { servicedOn, clientKey: key })).status).toBe(403);
    const first = await crew.request("POST", `${url}/${id}/services`, { servicedOn, note: "Cleaned the baskets", clientKey: key });
    expect(first.status).toBe(201);
    expect(localDay(new Date(first.json.piece.lastServicedAt), "UTC")).toBe(servicedOn);
    const again = await crew.request("POST", `${url}/${id}/services`, { servicedOn, note: "Cleaned the baskets", clientKey: key });
    expect(again.status).toBe(200);
    expect(again.json.repeated).toBe(true);
    expect(again.json.service.id).toBe(first.json.service.id);
    expect(await db().select().from(equipmentServices).where(eq(equipmentServices.equipmentId, id))).toHaveLength(1);
    const after = await page();
    expect(after).toContain(dateWords(addDays(servicedOn, 30)));
    expect(after).toContain("due in 28 days");
    expect(after).toContain("Cleaned the baskets");

    // An older service entered late is kept, but the last service stays the newer one.
    expect((await crew.request("POST", `${url}/${id}/services`, { servicedOn: addDays(today(), -20), clientKey: randomUUID() })).status).toBe(201);
    const [row] = await db().select().from(equipment).where(eq(equipment.id, id));
    expect(localDay(row.lastServicedAt!, "UTC")).toBe(servicedOn);

    const before = await dbDigest();
    const future = await crew.request("POST", `${url}/${id}/services`, { servicedOn: addDays(today(), 1), clientKey: randomUUID() });
    expect(future.status).toBe(400);
    expect(future.json.fields.servicedOn).toMatch(/can't be in the future/);
    const early = await crew.request("POST", `${url}/${id}/services`, { servicedOn: addDays(installedOn, -1), clientKey: randomUUID() });
    expect(early.status).toBe(400);
    expect(early.json.fields.servicedOn).toMatch(/before the piece was installed/);
    expect((await crew.request("POST", `${url}/${id}/services`, { servicedOn: "yesterday", clientKey: randomUUID() })).status).toBe(400);
    expect((await crew.request("POST", `${url}/${id}/services`, { servicedOn })).status).toBe(400);
    const other = (await crew.request("POST", url, piece({ kind: "heater" }))).json.piece.id as string;
    const before2 = await dbDigest();
    expect((await crew.request("POST", `${url}/${other}/services`, { servicedOn, clientKey: key })).status).toBe(409);
    expect(await dbDigest()).toEqual(before2);
    expect(Object.keys(before).length).toBeGreaterThan(10);
  });
});

describe("the company's service settings", () => {
  it("take a known time zone only, from the lead only", async () => {
    const t = await makeTeam();
    const [lead, crew] = await Promise.all([signedIn(t.lead), signedIn(t.crew)]);
    const before = await dbDigest();
    expect((await crew.request("PUT", "/api/settings/time-zone", { timeZone: "Europe/Berlin" })).status).toBe(403);
    expect((await lead.request("PUT", "/api/settings/time-zone", { timeZone: "Europe/Berlin\u0000" })).status).toBe(400);
    for (const bad of ["Mars/Olympus", "", 42, "+05:00"]) {
      const res = await lead.request("PUT", "/api/settings/time-zone", { timeZone: bad });
      expect(res.status, String(bad)).toBe(400);
      expect(res.json.fields.timeZone).toMatch(/time zone from the list/);
    }
    expect(await dbDigest()).toEqual(before);
    try {
      expect((await lead.request("PUT", "/api/settings/time-zone", { timeZone: "Pacific/Auckland" })).status).toBe(200);
      const [row] = await db().select({ tz: company.timeZone }).from(company);
      expect(row.tz).toBe("Pacific/Auckland");
      expect((await lead.get("/settings")).text).toContain('value="Pacific/Auckland" selected');
    } finally {
      await db().update(company).set({ timeZone: "UTC" });
    }
  });

  it("keep the company's own interval per kind, blank meaning none, and refuse intervals outside 1 to 3650 days", async () => {
    const t = await makeTeam("in_service");
    const [lead, crew] = await Promise.all([signedIn(t.lead), signedIn(t.crew)]);
    const all = { "canister filter": 120, "sump return pump": 180, heater: 180, chiller: 180, "UV clarifier": 180, lighting: 365, "protein skimmer": 30, "CO2 system": 90, "dosing pump": 90, other: "" };
    const before = await dbDigest();
    expect((await crew.request("PUT", "/api/settings/equipment-intervals", all)).status).toBe(403);
    const bad = await lead.request("PUT", "/api/settings/equipment-intervals", { ...all, heater: 0, lighting: 4000 });
    expect(bad.status).toBe(400);
    expect(bad.json.fields.heater).toMatch(/at least 1 day/);
    expect(bad.json.fields.lighting).toMatch(/3650 days/);
    expect(await dbDigest()).toEqual(before);
    try {
      const saved = await lead.request("PUT", "/api/settings/equipment-intervals", { ...all, "canister filter": "90", heater: "" });
      expect(saved.status).toBe(200);
      const [row] = await db().select({ v: company.equipmentIntervals }).from(company);
      expect(row.v).toEqual({ "canister filter": 90, heater: null });
      // A piece without its own interval follows the company's 90 days; a heater has no routine service now.
      const url = `/api/projects/${t.project.id}/equipment`;
      await lead.request("POST", url, piece({ installedOn: addDays(today(), -10), warrantyUntil: "" }));
      await lead.request("POST", url, piece({ kind: "heater", installedOn: addDays(today(), -10), warrantyUntil: "" }));
      // React marks the joins between a line's parts with empty comments.
      const page = (await lead.get(`/projects/${t.project.id}/equipment`)).text.replaceAll("<!-- -->", "");
      expect(page).toContain("every 90 days, the company");
      expect(page).toContain("no routine service");
    } finally {
      await db().update(company).set({ equipmentIntervals: {} });
    }
  });
});
