import { afterEach, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { company, projects } from "@/db/schema";
import { makeTeam, makeUser } from "../support/fixtures";
import { signedIn } from "../support/http";
import { insertReadings } from "./water-support";

async function storedRules() {
  const [row] = await db().select({ rules: company.cycleRules }).from(company).where(eq(company.id, 1));
  return row.rules;
}

describe("company cycle rules", () => {
  afterEach(async () => {
    // Other tests rely on the house defaults.
    await db().update(company).set({ cycleRules: {} }).where(eq(company.id, 1));
  });

  it("are the lead's to change; others get 403 and the settings page is hidden from them", async () => {
    const t = await makeTeam();
    for (const who of [t.crew, t.client]) {
      const s = await signedIn(who);
      expect((await s.request("PUT", "/api/settings/cycle-rules", { zeroReadingsNeeded: 3 })).status).toBe(403);
      expect((await s.get("/api/settings/cycle-rules")).status).toBe(403);
      const page = await s.get("/settings");
      expect(page.text).toContain("Nothing here, or not for you");
      expect(page.text).not.toContain("Save cycle rules");
    }
    expect(await storedRules()).toEqual({});
    const lead = await signedIn(t.lead);
    const page = await lead.get("/settings");
    expect(page.status).toBe(200);
    expect(page.text).toContain("Save cycle rules");

    const saved = await lead.request("PUT", "/api/settings/cycle-rules", { zeroReadingsNeeded: 3, minHoursBetweenZeros: "", requireNitrate: false });
    expect(saved.status).toBe(200);
    expect(await storedRules()).toEqual({ zeroReadingsNeeded: 3, requireNitrate: false });
    const read = await lead.get("/api/settings/cycle-rules");
    expect(read.json.rules.zeroReadingsNeeded).toBe(3);
    expect(read.json.rules.minHoursBetweenZeros).toBe(24);
    expect(read.json.defaults.zeroReadingsNeeded).toBe(2);
  });

  it("refuses out-of-range values field by field and keeps the old rules", async () => {
    const lead = await signedIn(await makeUser("lead"));
    await lead.request("PUT", "/api/settings/cycle-rules", { stallDays: 14 });
    const bad = await lead.request("PUT", "/api/settings/cycle-rules", { zeroReadingsNeeded: 0, stallDays: 2.5, maxAgeHoursOfLatest: "soon" });
    expect(bad.status).toBe(400);
    expect(bad.json.fields.maxAgeHoursOfLatest).toBeTruthy();
    const worse = await lead.request("PUT", "/api/settings/cycle-rules", { zeroReadingsNeeded: 0, stallDays: 2.5 });
    expect(worse.status).toBe(400);
    expect(worse.json.fields.zeroReadingsNeeded).toMatch(/from 1 to 7/);
    expect(worse.json.fields.stallDays).toMatch(/whole number/);
    expect(await storedRules()).toEqual({ stallDays: 14 });
  });

  it("re-checks cycling tanks when the rules loosen, sending the ready notice", async () => {
    const t = await makeTeam("cycling");
    await insertReadings(t.project.id, t.crew.id, [
      { hoursAgo: 24 * 8, ammonia: 2, nitrite: 0, nitrate: 0 },
      { hoursAgo: 12, ammonia: 0, nitrite: 0, nitrate: 20 },
      { hoursAgo: 2, ammonia: 0, nitrite: 0, nitrate: 20 },
    ]);
    const lead = await signedIn(t.lead);
    expect((await lead.get(`/api/projects/${t.project.id}/cycle`)).json.ready).toBe(false);
    const saved = await lead.request("PUT", "/api/settings/cycle-rules", { minHoursBetweenZeros: 8 });
    expect(saved.status).toBe(200);
    expect(saved.json.projectsNotified).toBeGreaterThanOrEqual(1);
    const [p] = await db().select().from(projects).where(eq(projects.id, t.project.id));
    expect(p.cycleReadyNotifiedAt).not.toBeNull();
  });
});
