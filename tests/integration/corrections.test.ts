import { describe, expect, it } from "vitest";
import { randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { db } from "@/db";
import { attachments, checklistItems, checklistTicks, visits, waterTests } from "@/db/schema";
import { getProject, makeTeam } from "../support/fixtures";
import { signedIn } from "../support/http";
import { tickAquascape } from "./board-support";
import { hoursAgo } from "./water-support";

const MINUTE = 60_000;
const reading = (over: Record<string, unknown> = {}) => ({
  takenAt: hoursAgo(1).toISOString(),
  ammoniaMgL: 1,
  nitriteMgL: 0.5,
  nitrateMgL: 5,
  pH: 7.8,
  temperature: 25,
  temperatureUnit: "C",
  ...over,
});

async function readyPhoto(projectId: string, by: string, caption: string | null = "Before the fill") {
  const id = randomUUID();
  const [row] = await db()
    .insert(attachments)
    .values({ projectId, stage: "aquascape", key: `test/${id}.jpg`, contentType: "image/jpeg", sizeBytes: 1000, fileName: "rock.jpg", caption, status: "ready", uploadedBy: by })
    .returning();
  return row;
}

describe("photos", () => {
  it("can be re-captioned by the lead or the uploader, and voided with a reason by the lead only", async () => {
    const t = await makeTeam("aquascape");
    const photo = await readyPhoto(t.project.id, t.crew.id);
    const crew = await signedIn(t.crew);
    const lead = await signedIn(t.lead);
    const client = await signedIn(t.client);
    expect((await crew.request("PATCH", `/api/projects/${t.project.id}/uploads/${photo.id}`, { caption: "Rockwork bedded, front left" })).status).toBe(200);
    expect((await client.request("PATCH", `/api/projects/${t.project.id}/uploads/${photo.id}`, { caption: "Mine now" })).status).toBe(403);
    expect((await crew.post(`/api/projects/${t.project.id}/uploads/${photo.id}/void`, { reason: "Blurred" })).status).toBe(403);
    expect((await lead.post(`/api/projects/${t.project.id}/uploads/${photo.id}/void`, {})).status).toBe(400);
    const voided = await lead.post(`/api/projects/${t.project.id}/uploads/${photo.id}/void`, { reason: "Shows the neighbour's house number" });
    expect(voided.status).toBe(200);
    const [row] = await db().select().from(attachments).where(eq(attachments.id, photo.id));
    expect(row).toMatchObject({ caption: "Rockwork bedded, front left", voidReason: "Shows the neighbour's house number", voidedBy: t.lead.id });
    // Gone from the client's photos and link; still on record for the team.
    expect((await client.get(`/api/attachments/${photo.id}`)).status).toBe(404);
    expect((await client.get(`/projects/${t.project.id}/photos`)).text).not.toContain("Rockwork bedded, front left");
    expect((await lead.get(`/projects/${t.project.id}/photos`)).text).toContain("Shows the neighbour&#x27;s house number");
  });
});

describe("visits", () => {
  it("booking and moving the install day moves the target install date; cancelling needs a reason", async () => {
    const t = await makeTeam("stand_load_check");
    const lead = await signedIn(t.lead);
    const booked = await lead.post(`/api/projects/${t.project.id}/visits`, { kind: "install day", startsAt: "2031-03-10T09:00:00Z", durationMinutes: 480 });
    expect(booked.status).toBe(201);
    expect((await getProject(t.project.id)).targetInstallDate).toBe("2031-03-10");
    const moved = await lead.request("PATCH", `/api/projects/${t.project.id}/visits/${booked.json.visit.id}`, { kind: "install day", startsAt: "2031-03-17T09:00:00Z", durationMinutes: 480, notes: "Moved a week for the stair lift" });
    expect(moved.status).toBe(200);
    expect((await getProject(t.project.id)).targetInstallDate).toBe("2031-03-17");

    const crew = await signedIn(t.crew);
    expect((await crew.post(`/api/projects/${t.project.id}/visits/${booked.json.visit.id}/cancel`, { reason: "Client away" })).status).toBe(403);
    expect((await lead.post(`/api/projects/${t.project.id}/visits/${booked.json.visit.id}/cancel`, {})).status).toBe(400);
    const cancelled = await lead.post(`/api/projects/${t.project.id}/visits/${booked.json.visit.id}/cancel`, { reason: "Client away that week" });
    expect(cancelled.status).toBe(200);
    const [row] = await db().select().from(visits).where(eq(visits.id, booked.json.visit.id));
    expect(row.cancelReason).toBe("Client away that week");
    expect((await lead.get(`/api/projects/${t.project.id}/visits`)).json.visits).toHaveLength(0);
    // A cancelled visit can't be changed.
    expect((await lead.request("PATCH", `/api/projects/${t.project.id}/visits/${row.id}`, { kind: "install day", startsAt: "2031-04-01T09:00:00Z", durationMinutes: 60 })).status).toBe(404);
  });
});

describe("the target install date and the booked install day", () => {
  it("a new target date moves the install day still ahead, at the same time of day; clearing it while booked is refused", async () => {
    const t = await makeTeam("stand_load_check");
    const lead = await signedIn(t.lead);
    const booked = await lead.post(`/api/projects/${t.project.id}/visits`, { kind: "install day", startsAt: "2031-03-10T09:00:00Z", durationMinutes: 480 });
    expect(booked.status).toBe(201);
    const version = () => getProject(t.project.id).then((p) => p.version);

    const changed = await lead.request("PATCH", `/api/projects/${t.project.id}`, { version: await version(), targetInstallDate: "2031-03-24" });
    expect(changed.status).toBe(200);
    expect(changed.json.movedInstallVisits).toBe(1);
    expect((await getProject(t.project.id)).targetInstallDate).toBe("2031-03-24");
    const [visit] = await db().select().from(visits).where(eq(visits.id, booked.json.visit.id));
    expect(visit.startsAt.toISOString()).toBe("2031-03-24T09:00:00.000Z");

    // Clearing the date would leave the booked day without one: refused, nothing changed.
    const before = await version();
    const cleared = await lead.request("PATCH", `/api/projects/${t.project.id}`, { version: before, targetInstallDate: "" });
    expect(cleared.status).toBe(422);
    expect(cleared.json.error).toContain("An install day is booked for this project");
    expect(await getProject(t.project.id)).toMatchObject({ targetInstallDate: "2031-03-24", version: before });

    // Once the visit is cancelled the date can be cleared, and a cancelled visit never moves.
    expect((await lead.post(`/api/projects/${t.project.id}/visits/${visit.id}/cancel`, { reason: "Client postponed" })).status).toBe(200);
    const clearedNow = await lead.request("PATCH", `/api/projects/${t.project.id}`, { version: before, targetInstallDate: "" });
    expect(clearedNow.status).toBe(200);
    expect(clearedNow.json.movedInstallVisits).toBe(0);
    const again = await lead.request("PATCH", `/api/projects/${t.project.id}`, { version: await version(), targetInstallDate: "2031-05-01" });
    expect(again.json.movedInstallVisits).toBe(0);
    const [still] = await db().select().from(visits).where(eq(visits.id, visit.id));
    expect(still.startsAt.toISOString()).toBe("2031-03-24T09:00:00.000Z");
  });
});

describe("crew taking back a mis-tap", () => {
  it("undoes their own tick inside the window, but not someone else's or an old one", async () => {
    const t = await makeTeam("aquascape");
    await tickAquascape(t.project, t.lead, 1); // makes sure items exist
    const [item] = await db().select().from(checklistItems).where(eq(checklistItems.stage, "aquascape")).limit(1);
    const crew = await signedIn(t.crew);
    const tick = await crew.post(`/api/projects/${t.project.id}/checklist/ticks`, { itemId: item.id, done: true, clientKey: randomUUID() });
    expect([200, 201]).toContain(tick.status);
    const undo = await crew.post(`/api/projects/${t.project.id}/checklist/ticks`, { itemId: item.id, done: false, clientKey: randomUUID() });
    expect(undo.status).toBe(201);
    expect(undo.json.tick.note).toBe("Undone: ticked by mistake");

    // Ticked eleven minutes ago: past the ten-minute window.
    await crew.post(`/api/projects/${t.project.id}/checklist/ticks`, { itemId: item.id, done: true, clientKey: randomUUID() });
    await db()
      .update(checklistTicks)
      .set({ at: new Date(Date.now() - 11 * MINUTE) })
      .where(and(eq(checklistTicks.projectId, t.project.id), eq(checklistTicks.itemId, item.id), eq(checklistTicks.done, true)));
    const late = await crew.post(`/api/projects/${t.project.id}/checklist/ticks`, { itemId: item.id, done: false, clientKey: randomUUID() });
    expect(late.status).toBe(403);
    expect(late.json.error).toContain("10 minutes");

    // Someone else's tick can't be undone by crew.
    const lead = await signedIn(t.lead);
    await lead.post(`/api/projects/${t.project.id}/checklist/ticks`, { itemId: item.id, done: true, clientKey: randomUUID() });
    expect((await crew.post(`/api/projects/${t.project.id}/checklist/ticks`, { itemId: item.id, done: false, clientKey: randomUUID() })).status).toBe(403);
  });

  it("takes back their own water test inside the window; it stays on record, voided", async () => {
    const t = await makeTeam("cycling");
    const crew = await signedIn(t.crew);
    const logged = await crew.post(`/api/projects/${t.project.id}/water-tests`, reading());
    expect(logged.status).toBe(201);
    const id = logged.json.test?.id ?? logged.json.id;
    const lead = await signedIn(t.lead);
    expect((await lead.post(`/api/projects/${t.project.id}/water-tests/${id}/take-back`, {})).status).toBe(403);
    const back = await crew.post(`/api/projects/${t.project.id}/water-tests/${id}/take-back`, {});
    expect(back.status).toBe(200);
    const [row] = await db().select().from(waterTests).where(eq(waterTests.id, id));
    expect(row.voidedBy).toBe(t.crew.id);

    const old = await crew.post(`/api/projects/${t.project.id}/water-tests`, reading());
    const oldId = old.json.test?.id ?? old.json.id;
    await db().update(waterTests).set({ createdAt: new Date(Date.now() - 11 * MINUTE) }).where(eq(waterTests.id, oldId));
    expect((await crew.post(`/api/projects/${t.project.id}/water-tests/${oldId}/take-back`, {})).status).toBe(403);
  });
});

describe("the cycling log", () => {
  it("refuses a reading dated in the future beyond a few minutes of clock drift", async () => {
    const t = await makeTeam("cycling");
    const crew = await signedIn(t.crew);
    const future = await crew.post(`/api/projects/${t.project.id}/water-tests`, reading({ takenAt: new Date(Date.now() + 9 * 60 * MINUTE).toISOString() }));
    expect(future.status).toBe(400);
    expect(future.json.fields.takenAt).toContain("in the future");
    const drift = await crew.post(`/api/projects/${t.project.id}/water-tests`, reading({ takenAt: new Date(Date.now() + 2 * MINUTE).toISOString() }));
    expect(drift.status).toBe(201);
  });

  it("shows clients neither voided readings nor the lead's reasons", async () => {
    const t = await makeTeam("cycling");
    const crew = await signedIn(t.crew);
    const kept = await crew.post(`/api/projects/${t.project.id}/water-tests`, reading({ notes: "Kept reading" }));
    const bad = await crew.post(`/api/projects/${t.project.id}/water-tests`, reading({ ammoniaMgL: 8, notes: "Wrong tank" }));
    const badId = bad.json.test?.id ?? bad.json.id;
    const lead = await signedIn(t.lead);
    expect((await lead.post(`/api/projects/${t.project.id}/water-tests/${badId}/void`, { reason: "Measured in the holding tank by mistake" })).status).toBe(200);
    const client = await signedIn(t.client);
    const list = await client.get(`/api/projects/${t.project.id}/water-tests`);
    expect(list.json.tests.map((r: { id: string }) => r.id)).toEqual([kept.json.test?.id ?? kept.json.id]);
    const page = await client.get(`/projects/${t.project.id}/water`);
    expect(page.status).toBe(200);
    expect(page.text).not.toContain("Measured in the holding tank by mistake");
    expect(page.text).not.toContain("Wrong tank");
    expect((await lead.get(`/projects/${t.project.id}/water`)).text).toContain("Measured in the holding tank by mistake");
  });
});
