import "server-only";
import { asc, eq, isNull } from "drizzle-orm";
import { db } from "../index";
import { company, holdingTanks } from "../schema";
import { conflict } from "../../server/errors";
import { DEFAULT_QUARANTINE_DAYS } from "../../lib/stocking/quarantine";

/** The company's holding tanks still in use, by name. */
export async function listHoldingTanks() {
  return db().select().from(holdingTanks).where(isNull(holdingTanks.retiredAt)).orderBy(asc(holdingTanks.name));
}

export type HoldingTankRow = Awaited<ReturnType<typeof listHoldingTanks>>[number];

export async function createHoldingTank(values: { name: string; volumeL: number; location: string }) {
  const [row] = await db().insert(holdingTanks).values(values).returning();
  return row;
}

/** The company's quarantine period in days. */
export async function getQuarantineDays(): Promise<number> {
  const [row] = await db().select({ days: company.quarantineDays }).from(company).limit(1);
  return row?.days ?? DEFAULT_QUARANTINE_DAYS;
}

export async function setQuarantineDays(days: number): Promise<void> {
  const updated = await db().update(company).set({ quarantineDays: days, updatedAt: new Date() }).where(eq(company.id, 1)).returning({ id: company.id });
  if (!updated.length) throw conflict("The company's record is missing; set the company up before changing its settings.");
}
