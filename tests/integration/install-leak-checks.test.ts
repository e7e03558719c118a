import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db";
import { leakChecks, materials } from "@/db/schema";
import { makeTeam } from "../support/fixtures";
import { signedIn } from "../support/http";

const HOUR = 3_600_000;

describe("fill and leak checks", () => {
  it("records the fill and the check at fill, and holds the day-after check until 20 hours have passed", async () => {
    const t = await makeTeam("fill_leak_test");
    const s = await signedIn(t.crew);
    const url = `/api/projects/${t.project.id}/leak-checks`;

    const early = await s.post(url, { kind: "at fill", passed: true });
    expect(early.status).toBe(422);
    expect(early.json.error).toMatch(/Record the fill first/);

    expect((await s.post(url, { kind: "filled", passed: true, hoseFlowLPerMin: 12.5, conditionerMl: 40 })).status).toBe(201);
    expect((await s.post(url, { kind: "at fill", passed: true, note: "Seams dry" })).status).toBe(201);

    const tooSoon = await s.post(url, { kind: "after 24 hours", passed: true });
    expect(tooSoon.status).toBe(422);
    expect(tooSoon.json.error).toMatch(/at least 20 hours/);

    const failedNoNote = await s.post(url, { kind: "at fill", passed: false });
    expect(failedNoNote.status).toBe(400);
    expect(failedNoNote.json.fields.note).toBeTruthy();

    // Move the fill back a day, as if the crew came back the next morning.
    await db().update(leakChecks).set({ at: new Date(Date.now() - 21 * HOUR) }).where(eq(leakChecks.projectId, t.project.id));
    const day = await s.post(url, { kind: "after 24 hours", passed: true, note: "Dry after a day" });
    expect(day.status).toBe(201);

    const list = await s.get(url);
    expect(list.json.passed).toBe(true);
    const rows = await db().select().from(leakChecks).where(eq(leakChecks.projectId, t.project.id));
    expect(rows.map((r) => r.kind).sort()).toEqual(["after 24 hours", "at fill", "filled"]);
    expect(rows.find((r) => r.kind === "filled")!.conditionerMl).toBe(40);

    expect((await (await signedIn(t.client)).post(url, { kind: "filled", passed: true })).status).toBe(403);
    expect((await (await signedIn(t.otherCrew)).get(url)).status).toBe(404);
  });
});

describe("materials list", () => {
  it("adds items and ticks them as loaded with who and when", async () => {
    const t = await makeTeam("aquascape");
    const s = await signedIn(t.crew);
    const url = `/api/projects/${t.project.id}/materials`;
    const bad = await s.post(url, { label: "Sand", quantity: 0, unit: "bags" });
    expect(bad.status).toBe(400);
    expect(bad.json.fields.quantity).toBeTruthy();
    const made = await s.post(url, { label: "Sand, 10 kg bags", quantity: 4, unit: "bags" });
    expect(made.status).toBe(201);
    const loaded = await s.patch(`${url}/${made.json.material.id}`, { loaded: true });
    expect(loaded.status).toBe(200);
    const [row] = await db().select().from(materials).where(eq(materials.projectId, t.project.id));
    expect(row.loadedBy).toBe(t.crew.id);
    expect(row.loadedAt).not.toBeNull();
    expect((await (await signedIn(t.otherCrew)).post(url, { label: "Rock", quantity: 1, unit: "kg" })).status).toBe(404);
  });
});
