import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { db } from "../index";
import { materials, tankDesigns, users } from "../schema";
import { notFound } from "../../server/errors";

const loader = alias(users, "loader");

export async function listMaterials(projectId: string) {
  return db()
    .select({
      id: materials.id,
      label: materials.label,
      quantity: materials.quantity,
      unit: materials.unit,
      loadedAt: materials.loadedAt,
      loadedByName: loader.name,
    })
    .from(materials)
    .leftJoin(loader, eq(loader.id, materials.loadedBy))
    .where(eq(materials.projectId, projectId))
    .orderBy(asc(materials.createdAt), asc(materials.label));
}

export async function addMaterial(projectId: string, input: { label: string; quantity: number; unit: string }) {
  const [row] = await db().insert(materials).values({ projectId, ...input }).returning();
  return row;
}

/** Ticks an item as loaded into the van (or clears it when it was taken off again). */
export async function setMaterialLoaded(projectId: string, materialId: string, loaded: boolean, userId: string) {
  const [row] = await db()
    .update(materials)
    .set(loaded ? { loadedAt: new Date(), loadedBy: userId } : { loadedAt: null, loadedBy: null })
    .where(and(eq(materials.id, materialId), eq(materials.projectId, projectId)))
    .returning();
  if (!row) throw notFound("That material");
  return row;
}

/** The project's saved tank design (raw JSON) for prefilling the bed and the fill volume, or null. */
export async function getDesignData(projectId: string): Promise<Record<string, unknown> | null> {
  const [row] = await db().select({ data: tankDesigns.data }).from(tankDesigns).where(eq(tankDesigns.projectId, projectId)).limit(1);
  return row?.data ?? null;
}

export async function getUnitSystem(userId: string): Promise<"metric" | "imperial"> {
  const [row] = await db().select({ unitSystem: users.unitSystem }).from(users).where(eq(users.id, userId)).limit(1);
  return row?.unitSystem ?? "metric";
}
