import { describe, expect, it } from "vitest";
import { db } from "@/db";
import { equipment, visits } from "@/db/schema";
import { makeProject, makeUser } from "../support/fixtures";
import { signedIn } from "../support/http";
import { addDays, localDay } from "@/lib/service/local-dates";

const today = () => localDay(new Date(), "UTC"); // the test company works in UTC

/** Two tanks in service, each with its own crew, a service visit and an overdue filter. */
async function twoTanks() {
  const [lead, teo, priya, client] = await Promise.all([makeUser("lead"), makeUser("crew"), makeUser("crew"), makeUser("client")]);
  const mine = await makeProject({ client, lead, crew: [teo], stage: "in_service", title: `Teo's tank ${Date.now()}` });
  const theirs = await makeProject({ client, lead, crew: [priya], stage: "in_service", title: `Priya's tank ${Date.now()}` });
  // A minute ago is today (or, just after midnight, yesterday: then it is on the list as overdue).
  const [teoVisit, priyaVisit] = await db()
    .insert(visits)
    .values([
      { projectId: mine.id, kind: "service visit", startsAt: new Date(Date.now() - 60_000), assignedTo: teo.id, createdBy: lead.id },
      { projectId: theirs.id, kind: "service visit", startsAt: new Date(Date.now() - 60_000), assignedTo: priya.id, createdBy: lead.id },
    ])
    .returning();
  await db()
    .insert(visits)
    .values([
      { projectId: mine.id, kind: "service visit", startsAt: new Date(Date.now() - 3 * 86_400_000), assignedTo: teo.id, createdBy: lead.id, notes: "late" },
      { projectId: mine.id, kind: "service visit", startsAt: new Date(Date.now() - 2 * 86_400_000), assignedTo: teo.id, createdBy: lead.id, completedAt: new Date() },
      { projectId: mine.id, kind: "service visit", startsAt: new Date(Date.now() - 2 * 86_400_000), assignedTo: teo.id, createdBy: lead.id, cancelledAt: new Date(), cancelReason: "away" },
    ]);
  await db()
    .insert(equipment)
    .values([
      { projectId: mine.id, kind: "canister filter", makeModel: "Canister T (house brand)", installedOn: addDays(today(), -200), lastServicedAt: new Date(Date.now() - 130 * 86_400_000), createdBy: lead.id },
      { projectId: theirs.id, kind: "canister filter", makeModel: "Canister P (house brand)", installedOn: addDays(today(), -200), createdBy: lead.id },
    ]);
  return { lead, teo, priya, client, mine, theirs, teoVisit, priyaVisit };
}

describe("the due list", () => {
  it("shows the lead everything open across the tanks, overdue on top, linked to each visit's report", async () => {
    const s = await twoTanks();
    const lead = await signedIn(s.lead);
    const page = await lead.get("/due?person=all");
    expect(page.status).toBe(200);
    expect(page.text).toContain(s.mine.title);
    expect(page.text).toContain(s.theirs.title);
    expect(page.text).toContain(`/projects/${s.mine.id}/service/visits/${s.teoVisit.id}`);
    expect(page.text).toContain(`/projects/${s.theirs.id}/service/visits/${s.priyaVisit.id}`);
    expect(page.text).toContain("Service the canister filter (Canister T (house brand))");
    expect(page.text).toContain("overdue by 10 days"); // 130 days since the last service, 120-day default (common practice)
    const overdueAt = page.text.indexOf("Overdue (");
    expect(overdueAt).toBeGreaterThan(-1);
    expect(overdueAt).toBeLessThan(page.text.indexOf("Service the canister filter (Canister T"));
    // One person's list, picked by the lead.
    const priyas = await lead.get(`/due?person=${s.priya.id}`);
    expect(priyas.text).toContain(s.theirs.title);
    expect(priyas.text).not.toContain(s.mine.title);
  });

  it("shows crew their own week by default, only from projects they are on; clients get 404", async () => {
    const s = await twoTanks();
    const [teo, client] = await Promise.all([signedIn(s.teo), signedIn(s.client)]);
    const mine = await teo.get("/due");
    expect(mine.status).toBe(200);
    expect(mine.text).toContain("My week");
    expect(mine.text).toContain(s.mine.title);
    expect(mine.text).toContain(`/projects/${s.mine.id}/service/visits/${s.teoVisit.id}`);
    expect(mine.text).not.toContain(s.theirs.title);
    // The one left undone three days ago is overdue; the done and the cancelled ones are not on the list.
    expect((mine.text.match(/data-testid="due-item"/g) ?? []).length).toBe(3);
    for (const path of ["/due?person=all", `/due?person=${s.priya.id}`, "/due?week=1&person=all", "/due?week=-1"]) {
      const res = await teo.get(path);
      expect(res.status, path).toBe(200);
      expect(res.text, path).not.toContain(s.theirs.title);
    }
    expect((await client.get("/due")).status).toBe(404);
  });

  it("says so when nothing is due, and takes any week offset in the address calmly", async () => {
    const idle = await makeUser("crew");
    const s = await signedIn(idle);
    const page = await s.get("/due");
    expect(page.text).toContain("Nothing due this week");
    expect((await s.get("/due?week=lots")).text).toContain("Nothing due this week");
    expect((await s.get("/due?week=1")).text).toContain("Nothing due next week");
    expect((await s.get("/due?week=99999&person=%00")).status).toBe(200);
  });
});
