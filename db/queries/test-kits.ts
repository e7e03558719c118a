import "server-only";
import { and, asc, eq, isNull } from "drizzle-orm";
import { db } from "../index";
import { projectTestKits, testKits } from "../schema";
import { ANALYTES, NEUTRAL_TEST_KITS, type KitBasis, type TestKit } from "../../lib/cycling/test-kits";
import type { Analyte } from "../../lib/cycling/readings";
import { AppError } from "../../server/errors";

/** A kit as pages show it; `id` is null for our neutral steps. */
export type KitView = TestKit & { id: string | null; retired: boolean };

const neutral = (a: Analyte): KitView => ({ ...NEUTRAL_TEST_KITS[a], steps: [...NEUTRAL_TEST_KITS[a].steps], id: null, retired: false });

type Row = typeof testKits.$inferSelect;
const view = (r: Row): KitView => ({ id: r.id, name: r.name, analyte: r.analyte, basis: r.basis, steps: r.steps, retired: r.retiredAt !== null });

/** The company's kits, in use first, by analyte and name. */
export async function listTestKits({ includeRetired = false } = {}): Promise<KitView[]> {
  const rows = await db()
    .select()
    .from(testKits)
    .where(includeRetired ? undefined : isNull(testKits.retiredAt))
    .orderBy(asc(testKits.retiredAt), asc(testKits.analyte), asc(testKits.name));
  return rows.map(view);
}

export async function addTestKit(kit: { name: string; analyte: Analyte; basis: KitBasis; steps: number[] }, createdBy: string): Promise<KitView> {
  const [row] = await db()
    .insert(testKits)
    .values({ name: kit.name.trim(), analyte: kit.analyte, basis: kit.basis, steps: kit.steps, createdBy })
    .returning();
  return view(row);
}

/** Retires a kit: no longer offered for new choices; projects that chose it fall back to the neutral steps. */
export async function retireTestKit(id: string, now = new Date()): Promise<KitView> {
  const [row] = await db()
    .update(testKits)
    .set({ retiredAt: now })
    .where(and(eq(testKits.id, id), isNull(testKits.retiredAt)))
    .returning();
  if (!row) throw new AppError(404, "That kit wasn't found, or it is already retired.");
  return view(row);
}

/** The kit each analyte is read with on a project: the chosen one while it is in use, else the neutral steps. */
export async function getProjectKits(projectId: string): Promise<Record<Analyte, KitView>> {
  const rows = await db()
    .select({ kit: testKits })
    .from(projectTestKits)
    .innerJoin(testKits, eq(testKits.id, projectTestKits.kitId))
    .where(and(eq(projectTestKits.projectId, projectId), isNull(testKits.retiredAt)));
  const out = Object.fromEntries(ANALYTES.map((a) => [a, neutral(a)])) as Record<Analyte, KitView>;
  for (const { kit } of rows) out[kit.analyte] = view(kit);
  return out;
}

/** Sets (or, with null, clears) the kit a project reads one analyte with. The kit must be in use and for that analyte. */
export async function chooseProjectKit(projectId: string, analyte: Analyte, kitId: string | null, chosenBy: string): Promise<Record<Analyte, KitView>> {
  await db().transaction(async (tx) => {
    if (kitId === null) {
      await tx.delete(projectTestKits).where(and(eq(projectTestKits.projectId, projectId), eq(projectTestKits.analyte, analyte)));
      return;
    }
    const [kit] = await tx.select().from(testKits).where(and(eq(testKits.id, kitId), isNull(testKits.retiredAt)));
    if (!kit) throw new AppError(404, "That kit wasn't found, or it has been retired.");
    if (kit.analyte !== analyte) throw new AppError(422, `${kit.name} tests ${kit.analyte}, not ${analyte}.`);
    await tx
      .insert(projectTestKits)
      .values({ projectId, analyte, kitId, chosenBy })
      .onConflictDoUpdate({ target: [projectTestKits.projectId, projectTestKits.analyte], set: { kitId, chosenBy, chosenAt: new Date() } });
  });
  return getProjectKits(projectId);
}
