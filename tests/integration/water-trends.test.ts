import { describe, expect, it } from "vitest";
import { db } from "@/db";
import { waterTests } from "@/db/schema";
import { makeTeam } from "../support/fixtures";
import { anonymous, signedIn } from "../support/http";

const DAY = 86_400_000;

describe("the trends and water-change page", () => {
  it("shows the lead, the assigned crew and the owning client the same read-only page, and hides it from others", async () => {
    const t = await makeTeam("in_service");
    const now = Date.now();
    // After-change 10 → before-next 17 over 7 days, twice: 1 mg/L a day (arithmetic).
    await db()
      .insert(waterTests)
      .values(
        [
          [21, 10],
          [14, 17],
          [13, 10],
          [6, 17],
        ].map(([daysAgo, nitrate]) => ({ projectId: t.project.id, takenAt: new Date(now - daysAgo * DAY), nitrateMgL: nitrate, pH: 7.5, tempC: 25, takenBy: t.crew.id })),
      );
    const path = `/projects/${t.project.id}/water/trends`;
    for (const who of [t.lead, t.crew, t.client]) {
      const page = await (await signedIn(who)).get(path);
      expect(page.status, who.role).toBe(200);
      expect(page.text, who.role).toContain("Water-change planner");
      expect(page.text, who.role).toContain("Nitrate, pH and temperature over time");
      // The rise field is pre-filled with the measured 1 mg/L a day, and nothing on the page writes.
      expect(page.text, who.role).toMatch(/id="plan-rise"[^>]*value="1"/);
      expect(page.text, who.role).not.toContain("<form");
    }
    for (const who of [t.otherCrew, t.otherClient]) {
      const page = await (await signedIn(who)).get(path);
      expect(page.text, who.role).not.toContain(t.project.title);
      if (page.status !== 404) expect(page.text).toContain("Nothing here, or not for you");
    }
    const anon = await anonymous().get(path);
    expect(anon.text).not.toContain(t.project.title);
  });

  it("says so when there are no readings yet", async () => {
    const t = await makeTeam("in_service");
    const page = await (await signedIn(t.lead)).get(`/projects/${t.project.id}/water/trends`);
    expect(page.status).toBe(200);
    expect(page.text).toContain("No water tests yet.");
    expect(page.text).toContain("Not enough tests to measure it yet");
  });
});
