/** Records the gates read, written straight to the test database for board tests. */
import { and, eq, isNull } from "drizzle-orm";
import { generateKeyBetween } from "fractional-indexing";
import { db } from "@/db";
import { planBatches, checklistItems, checklistTicks, leakChecks, loadApprovals, siteSurveys, stageEvents, stockingBatches, tankDesigns, waterTests } from "@/db/schema";

type Id = { id: string };
const HOUR = 3_600_000;

export async function completeSurvey(project: Id, by: Id, complete = true) {
  await db().insert(siteSurveys).values({ projectId: project.id, data: { floor: "concrete slab" }, complete, updatedBy: by.id });
}

export async function approveLoad(project: Id, by: Id, design: Record<string, unknown> = { lengthMm: 1200, widthMm: 500 }) {
  await db().insert(tankDesigns).values({ projectId: project.id, data: design, updatedBy: by.id }).onConflictDoUpdate({ target: tankDesigns.projectId, set: { data: design } });
  await db().insert(loadApprovals).values({ projectId: project.id, designSnapshot: design, resultSnapshot: { ok: true }, approvedBy: by.id });
}

export async function changeDesign(project: Id, design: Record<string, unknown>) {
  await db().update(tankDesigns).set({ data: design }).where(eq(tankDesigns.projectId, project.id));
}

/** Ticks every live aquascape item for the project except `leaveOpen` of them; adds one item when none exists. */
export async function tickAquascape(project: Id, by: Id, leaveOpen = 0) {
  let items = await db().select().from(checklistItems).where(and(eq(checklistItems.stage, "aquascape"), isNull(checklistItems.retiredAt)));
  if (!items.length) {
    await db().insert(checklistItems).values({ stage: "aquascape", label: "Rockwork bedded on the base layer", position: generateKeyBetween(null, null) });
    items = await db().select().from(checklistItems).where(and(eq(checklistItems.stage, "aquascape"), isNull(checklistItems.retiredAt)));
  }
  const done = items.slice(leaveOpen);
  // An older untick before the tick, so the newest row is the one that counts.
  for (const item of done) {
    await db().insert(checklistTicks).values({ projectId: project.id, itemId: item.id, done: false, byUserId: by.id });
    await db().insert(checklistTicks).values({ projectId: project.id, itemId: item.id, done: true, byUserId: by.id });
  }
  return items.length;
}

export async function recordLeakChecks(project: Id, by: Id, after24hPassed: boolean) {
  const t = Date.now() - 30 * HOUR;
  await db().insert(leakChecks).values([
    { projectId: project.id, kind: "filled", passed: true, byUserId: by.id, at: new Date(t) },
    { projectId: project.id, kind: "after 24 hours", passed: !after24hPassed, byUserId: by.id, at: new Date(t + 24 * HOUR) },
    { projectId: project.id, kind: "after 24 hours", passed: after24hPassed, byUserId: by.id, at: new Date(t + 25 * HOUR) },
  ]);
}

/** A fishless cycle that finished: ammonia and nitrite seen, then two zeros a day apart, with nitrate. */
export async function finishCycle(project: Id, by: Id) {
  const now = Date.now();
  await db().insert(stageEvents).values({ projectId: project.id, fromStage: "fill_leak_test", toStage: "cycling", byUserId: by.id, at: new Date(now - 20 * 24 * HOUR) });
  const rows = [
    { h: 18 * 24, nh3: 2, no2: 0, no3: 0 },
    { h: 12 * 24, nh3: 1, no2: 2, no3: 5 },
    { h: 6 * 24, nh3: 0, no2: 1, no3: 10 },
    { h: 30, nh3: 0, no2: 0, no3: 20 },
    { h: 2, nh3: 0, no2: 0, no3: 20 },
  ];
  await db().insert(waterTests).values(
    rows.map((r) => ({ projectId: project.id, takenAt: new Date(now - r.h * HOUR), ammoniaMgL: r.nh3, nitriteMgL: r.no2, nitrateMgL: r.no3, pH: 7.4, tempC: 25, takenBy: by.id })),
  );
}

/** The plan's first batch, through quarantine and into the display, as the in-service gate reads it. */
export async function recordStocking(project: Id, by: Id) {
  const [batch] = await db().insert(stockingBatches).values({ projectId: project.id, addedAt: new Date(), description: "Six invented tetras", fishCount: 6, byUserId: by.id }).returning();
  await db().insert(planBatches).values({
    projectId: project.id,
    position: 1,
    quarantineStartedAt: new Date(Date.now() - 30 * 24 * HOUR),
    quarantineDays: 28,
    stockingBatchId: batch.id,
    createdBy: by.id,
  });
}
