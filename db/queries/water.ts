import "server-only";
import { and, desc, eq, isNull } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { db, type Tx } from "../index";
import { ammoniaDoses, projects, tankDesigns, users, waterTests } from "../schema";
import { notifyIfCycleReady } from "./cycle-ready";
import { AMMONIA_TEMP_RANGE_C, freeAmmoniaMgL } from "../../lib/cycling/free-ammonia";
import { computeLoad } from "../../lib/tank/load";
import { validateDesign, type TankDesign } from "../../lib/tank/design";
import { AppError, conflict, notFound } from "../../server/errors";

/** A reading in SI units, as validated at the boundary. */
export type ReadingValues = {
  takenAt: Date;
  ammoniaMgL: number | null;
  nitriteMgL: number | null;
  nitrateMgL: number | null;
  pH: number | null;
  tempC: number | null;
  khDkh: number | null;
  salinityPpt?: number | null;
  notes: string | null;
};

/** Locks the project row first, so every write here queues behind the same lock as the notice check. */
export async function lockProject(tx: Tx, projectId: string) {
  const [row] = await tx.select({ id: projects.id, stage: projects.stage }).from(projects).where(eq(projects.id, projectId)).for("update");
  if (!row) throw notFound();
  return row;
}

function freeNH3(ammonia: number | null, pH: number | null, tempC: number | null): number | null {
  if (ammonia == null || pH == null || tempC == null) return null;
  if (pH < 0 || pH > 14 || tempC < AMMONIA_TEMP_RANGE_C.min || tempC > AMMONIA_TEMP_RANGE_C.max) return null;
  return freeAmmoniaMgL(ammonia, pH, tempC);
}

/** Every reading of a project, newest first, with who took it, free NH3, and void details. */
/**
 * A project's water tests, newest first. Clients get `includeVoided: false`: a voided reading and the
 * lead's reason for it stay with the team (the filter is in the `where`).
 */
export async function listWaterTests(projectId: string, opts: { includeVoided: boolean } = { includeVoided: true }) {
  const taker = alias(users, "taker");
  const voider = alias(users, "voider");
  const rows = await db()
    .select({ test: waterTests, takenByName: taker.name, takenByRole: taker.role, voidedByName: voider.name })
    .from(waterTests)
    .innerJoin(taker, eq(taker.id, waterTests.takenBy))
    .leftJoin(voider, eq(voider.id, waterTests.voidedBy))
    .where(opts.includeVoided ? eq(waterTests.projectId, projectId) : and(eq(waterTests.projectId, projectId), isNull(waterTests.voidedAt)))
    .orderBy(desc(waterTests.takenAt), desc(waterTests.createdAt));
  return rows.map(({ test, takenByName, takenByRole, voidedByName }) => ({
    id: test.id,
    takenAt: test.takenAt,
    ammoniaMgL: test.ammoniaMgL,
    nitriteMgL: test.nitriteMgL,
    nitrateMgL: test.nitrateMgL,
    pH: test.pH,
    tempC: test.tempC,
    khDkh: test.khDkh,
    notes: test.notes,
    takenBy: { id: test.takenBy, name: takenByName, role: takenByRole },
    freeAmmoniaMgL: test.voidedAt ? null : freeNH3(test.ammoniaMgL, test.pH, test.tempC),
    correctsId: test.correctsId,
    createdAt: test.createdAt,
    voided: test.voidedAt !== null,
    voidedAt: test.voidedAt,
    voidedByName,
    voidReason: test.voidReason,
  }));
}

export type WaterTestRow = Awaited<ReturnType<typeof listWaterTests>>[number];

/** Saves a reading and, in the same transaction, sends the "cycle ready" notice if it opened the gate. */
export async function addWaterTest(projectId: string, takenBy: string, values: ReadingValues, now = new Date()) {
  return db().transaction(async (tx) => {
    await lockProject(tx, projectId);
    const [row] = await tx.insert(waterTests).values({ projectId, takenBy, ...values }).returning();
    const notified = await notifyIfCycleReady(tx, projectId, now);
    return { test: row, notified };
  });
}

async function voidOpenTest(tx: Tx, projectId: string, testId: string, voidedBy: string, reason: string, now: Date) {
  const [row] = await tx
    .update(waterTests)
    .set({ voidedAt: now, voidedBy, voidReason: reason })
    .where(and(eq(waterTests.id, testId), eq(waterTests.projectId, projectId), isNull(waterTests.voidedAt)))
    .returning();
  if (row) return row;
  const [existing] = await tx.select({ id: waterTests.id }).from(waterTests).where(and(eq(waterTests.id, testId), eq(waterTests.projectId, projectId)));
  if (!existing) throw notFound("That water test");
  throw conflict("That water test was already voided; nothing changed.");
}

/** Marks a reading as entered in error. It stays on record, with who voided it and why. */
/** One water test on a project, or null. */
export async function getWaterTest(projectId: string, testId: string) {
  const [row] = await db().select().from(waterTests).where(and(eq(waterTests.projectId, projectId), eq(waterTests.id, testId)));
  return row ?? null;
}

export async function voidWaterTest(projectId: string, testId: string, voidedBy: string, reason: string, now = new Date()) {
  return db().transaction(async (tx) => {
    await lockProject(tx, projectId);
    const test = await voidOpenTest(tx, projectId, testId, voidedBy, reason, now);
    // Voiding a bad reading can be what opens the gate.
    await notifyIfCycleReady(tx, projectId, now);
    return test;
  });
}

/**
 * Replaces a reading with corrected values: a new row pointing at the old one, the old one voided
 * with the reason. The new row keeps the original taker, since they took the sample.
 */
export async function correctWaterTest(projectId: string, testId: string, correctedBy: string, values: ReadingValues, reason: string, now = new Date()) {
  return db().transaction(async (tx) => {
    await lockProject(tx, projectId);
    const old = await voidOpenTest(tx, projectId, testId, correctedBy, `Corrected: ${reason}`, now);
    // The form edits time to the minute; an unchanged minute keeps the original's exact time, so the
    // correction takes the old reading's place in the history rather than sorting just before it.
    const sameMinute = Math.floor(values.takenAt.getTime() / 60_000) === Math.floor(old.takenAt.getTime() / 60_000);
    const takenAt = sameMinute ? old.takenAt : values.takenAt;
    const [row] = await tx.insert(waterTests).values({ projectId, takenBy: old.takenBy, correctsId: old.id, ...values, takenAt }).returning();
    await notifyIfCycleReady(tx, projectId, now);
    return { test: row, corrected: old };
  });
}

/** Ammonia doses of a project, newest first. */
export async function listDoses(projectId: string) {
  const by = alias(users, "by");
  const rows = await db()
    .select({ dose: ammoniaDoses, byName: by.name })
    .from(ammoniaDoses)
    .innerJoin(by, eq(by.id, ammoniaDoses.byUserId))
    .where(eq(ammoniaDoses.projectId, projectId))
    .orderBy(desc(ammoniaDoses.dosedAt));
  return rows.map(({ dose, byName }) => ({ ...dose, byName, voided: dose.voidedAt !== null }));
}

export type DoseRow = Awaited<ReturnType<typeof listDoses>>[number];

export async function addDose(
  projectId: string,
  byUserId: string,
  values: { dosedAt: Date; targetMgL: number; amountMl: number | null; sourcePercent: number | null; notes: string | null },
) {
  const [row] = await db().insert(ammoniaDoses).values({ projectId, byUserId, ...values }).returning();
  return row;
}

export async function voidDose(projectId: string, doseId: string, voidedBy: string, reason: string, now = new Date()) {
  return db().transaction(async (tx) => {
    await lockProject(tx, projectId);
    const [row] = await tx
      .update(ammoniaDoses)
      .set({ voidedAt: now, voidedBy, voidReason: reason })
      .where(and(eq(ammoniaDoses.id, doseId), eq(ammoniaDoses.projectId, projectId), isNull(ammoniaDoses.voidedAt)))
      .returning();
    if (!row) {
      const [existing] = await tx.select({ id: ammoniaDoses.id }).from(ammoniaDoses).where(and(eq(ammoniaDoses.id, doseId), eq(ammoniaDoses.projectId, projectId)));
      if (!existing) throw notFound("That dose");
      throw conflict("That dose was already voided; nothing changed.");
    }
    await notifyIfCycleReady(tx, projectId, now);
    return row;
  });
}

/** The water the tank holds by its design (net of rock and substrate, plus the sump), or null without a usable design. */
export async function getDesignVolume(projectId: string): Promise<{ netVolumeL: number; sumpVolumeL: number } | null> {
  const [row] = await db().select({ data: tankDesigns.data }).from(tankDesigns).where(eq(tankDesigns.projectId, projectId));
  if (!row) return null;
  try {
    const design = row.data as unknown as TankDesign;
    if (validateDesign(design).length) return null;
    const load = computeLoad(design);
    const sump = Number.isFinite(design.sumpVolumeL) ? (design.sumpVolumeL as number) : 0;
    return load.netVolumeL > 0 ? { netVolumeL: load.netVolumeL, sumpVolumeL: sump } : null;
  } catch {
    // A design saved by an older version may not fit today's shape; the calculator then asks for the volume.
    return null;
  }
}

/** The person's unit system, for converting at the edge. */
export async function getUnitSystem(userId: string): Promise<"metric" | "imperial"> {
  const [row] = await db().select({ unitSystem: users.unitSystem }).from(users).where(eq(users.id, userId));
  if (!row) throw new AppError(401, "Sign in to continue.");
  return row.unitSystem;
}
