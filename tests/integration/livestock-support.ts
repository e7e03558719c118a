/** Set-up for the fish tests: a tank design, catalogue species by name, a holding tank, a cycled tank. */
import { randomUUID } from "node:crypto";
import { eq, inArray } from "drizzle-orm";
import { db } from "@/db";
import { holdingTanks, livestockEvents, livestockGroups, planBatches, species, stockingBatches, tankDesigns } from "@/db/schema";
import { DEMO_DESIGNS } from "@/db/seed/demo-survey";
import { nearlyCycled, insertReadings } from "./water-support";

type Id = { id: string };
export const DAY = 86_400_000;
export const daysAgo = (d: number) => new Date(Date.now() - d * DAY).toISOString();

/** A 1500 × 600 × 600 mm fresh-water design from the demo (about 450 L net). */
export async function giveDesign(project: Id, by: Id) {
  await db().insert(tankDesigns).values({ projectId: project.id, data: DEMO_DESIGNS["aldous-hall"] as unknown as Record<string, unknown>, updatedBy: by.id });
}

/** Catalogue species (seeded with the demo) by common name. */
export async function speciesIds(...names: string[]): Promise<Record<string, string>> {
  const rows = await db().select({ id: species.id, name: species.commonName }).from(species).where(inArray(species.commonName, names));
  if (rows.length !== names.length) throw new Error(`Missing species in the catalogue: ${names.join(", ")}`);
  return Object.fromEntries(rows.map((r) => [r.name, r.id]));
}

export async function makeHoldingTank() {
  const [row] = await db().insert(holdingTanks).values({ name: `Test rack ${randomUUID().slice(0, 4)}`, volumeL: 150, location: "Workshop" }).returning();
  return row;
}

/** A finished cycle with a zero test three hours ago, so the first batch may go in. */
export async function cycled(project: Id, by: Id) {
  await nearlyCycled(project.id, by.id, 40);
  await insertReadings(project.id, by.id, [{ hoursAgo: 3, ammonia: 0, nitrite: 0, nitrate: 40 }]);
}

/** What the fish tables hold for a project, to prove a refusal saved nothing. */
export async function fishRows(projectId: string) {
  const [batches, groups, events, planned] = await Promise.all([
    db().select().from(stockingBatches).where(eq(stockingBatches.projectId, projectId)),
    db().select().from(livestockGroups).where(eq(livestockGroups.projectId, projectId)),
    db().select().from(livestockEvents).where(eq(livestockEvents.projectId, projectId)),
    db().select().from(planBatches).where(eq(planBatches.projectId, projectId)),
  ]);
  return { batches: batches.length, groups: groups.length, events: events.length, planned: planned.length };
}
