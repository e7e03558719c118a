import "server-only";
import { and, asc, eq, inArray, isNull } from "drizzle-orm";
import { db, type Db, type Tx } from "../index";
import { species } from "../schema";
import { conflict, notFound } from "../../server/errors";
import type { Species } from "../../lib/stocking/species";

export type SpeciesRow = typeof species.$inferSelect;
export type SpeciesValues = Omit<typeof species.$inferInsert, "id" | "updatedAt" | "updatedBy" | "retiredAt">;

/** The catalogue in the checks' shape. */
export function toCheckSpecies(r: SpeciesRow): Species {
  return {
    id: r.id,
    commonName: r.commonName,
    scientificName: r.scientificName,
    water: r.water,
    tempC: { min: r.tempMinC, max: r.tempMaxC },
    pH: { min: r.phMin, max: r.phMax },
    adultLengthMm: r.adultLengthMm,
    temperament: r.temperament,
    territorial: r.territorial,
    shoalMin: r.shoalMin,
    level: r.level,
    coralSafe: r.coralSafe,
    invertSafe: r.invertSafe,
    diet: r.diet,
    minTankLengthMm: r.minTankLengthMm,
  };
}

/** The company's catalogue by water kind and name; retired species only when asked. */
export async function listSpecies(opts: { includeRetired?: boolean } = {}) {
  return db()
    .select()
    .from(species)
    .where(opts.includeRetired ? undefined : isNull(species.retiredAt))
    .orderBy(asc(species.water), asc(species.commonName));
}

/** Live species by id, for validating a plan; missing or retired ids are simply absent. */
export async function liveSpeciesByIds(ids: string[], conn: Db | Tx = db()): Promise<Map<string, SpeciesRow>> {
  if (!ids.length) return new Map();
  const rows = await conn.select().from(species).where(and(inArray(species.id, ids), isNull(species.retiredAt)));
  return new Map(rows.map((r) => [r.id, r]));
}

// Drizzle wraps the driver's error; the unique-violation code sits on it or on its cause.
function duplicateName(error: unknown): boolean {
  const e = error as { code?: string; cause?: { code?: string } } | null;
  return e?.code === "23505" || e?.cause?.code === "23505";
}

export async function createSpecies(values: SpeciesValues, userId: string) {
  try {
    const [row] = await db().insert(species).values({ ...values, updatedBy: userId }).returning();
    return row;
  } catch (error) {
    if (duplicateName(error)) throw conflict(`${values.scientificName} is already in the catalogue.`);
    throw error;
  }
}

export async function updateSpecies(id: string, values: SpeciesValues, userId: string) {
  try {
    const [row] = await db()
      .update(species)
      .set({ ...values, updatedBy: userId, updatedAt: new Date() })
      .where(eq(species.id, id))
      .returning();
    if (!row) throw notFound("That species");
    return row;
  } catch (error) {
    if (duplicateName(error)) throw conflict(`${values.scientificName} is already in the catalogue.`);
    throw error;
  }
}
