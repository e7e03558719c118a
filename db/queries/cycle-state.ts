import "server-only";
import { and, asc, desc, eq, isNull } from "drizzle-orm";
import { db, type Db, type Tx } from "../index";
import { ammoniaDoses, company, projects, stageEvents, waterTests } from "../schema";
import { evaluateCycle, type CycleEvaluation } from "../../lib/cycling/evaluate-cycle";
import { DEFAULT_CYCLE_RULES, validateCycleRules, type CycleRules } from "../../lib/cycling/cycle-rules";
import type { AmmoniaDose, WaterTest } from "../../lib/cycling/readings";

/**
 * The company's cycle rules as stored (a partial override of the defaults). A stored value that
 * fails today's checks is left out, so the default applies instead of the gate failing outright.
 */
export async function getCompanyCycleRules(conn: Db | Tx = db()): Promise<Partial<CycleRules>> {
  const [row] = await conn.select({ rules: company.cycleRules }).from(company).limit(1);
  const stored = (row?.rules ?? {}) as Partial<Record<keyof CycleRules, unknown>>;
  const bad = new Set(validateCycleRules(stored).map((p) => p.field));
  const rules: Partial<Record<keyof CycleRules, unknown>> = {};
  for (const key of Object.keys(DEFAULT_CYCLE_RULES) as (keyof CycleRules)[]) {
    if (stored[key] !== undefined && !bad.has(key)) rules[key] = stored[key];
  }
  return rules as Partial<CycleRules>;
}

/**
 * When the project's current cycle began: its recorded start, or for projects from before that was
 * kept, when it last entered cycling. Null if it never has.
 */
export async function getCycleStartedAt(projectId: string, conn: Db | Tx = db()): Promise<Date | null> {
  const [project] = await conn.select({ at: projects.cycleStartedAt }).from(projects).where(eq(projects.id, projectId));
  if (project?.at) return project.at;
  const [row] = await conn
    .select({ at: stageEvents.at })
    .from(stageEvents)
    .where(and(eq(stageEvents.projectId, projectId), eq(stageEvents.toStage, "cycling")))
    .orderBy(desc(stageEvents.at))
    .limit(1);
  return row?.at ?? null;
}

/** The readings and doses the cycle gate counts: voided ones are left out. */
export async function getCycleInputs(projectId: string, conn: Db | Tx = db()) {
  const [tests, doses] = await Promise.all([
    conn.select().from(waterTests).where(and(eq(waterTests.projectId, projectId), isNull(waterTests.voidedAt))).orderBy(asc(waterTests.takenAt)),
    conn.select().from(ammoniaDoses).where(and(eq(ammoniaDoses.projectId, projectId), isNull(ammoniaDoses.voidedAt))).orderBy(asc(ammoniaDoses.dosedAt)),
  ]);
  const readings: WaterTest[] = tests.map((t) => ({
    id: t.id,
    takenAt: t.takenAt,
    ammoniaMgL: t.ammoniaMgL,
    nitriteMgL: t.nitriteMgL,
    nitrateMgL: t.nitrateMgL,
    pH: t.pH,
    tempC: t.tempC,
    khDkh: t.khDkh,
  }));
  const doseList: AmmoniaDose[] = doses.map((d) => ({ id: d.id, dosedAt: d.dosedAt, targetMgL: d.targetMgL }));
  return { readings, doses: doseList };
}

/**
 * The cycle gate for one project, as the board's move into first stocking and the cycling page
 * both see it: the company's rules over the project's readings and doses since cycling began.
 */
export async function getCycleEvaluation(projectId: string, now = new Date(), conn: Db | Tx = db()): Promise<CycleEvaluation> {
  const [rules, cycleStartedAt, inputs] = await Promise.all([getCompanyCycleRules(conn), getCycleStartedAt(projectId, conn), getCycleInputs(projectId, conn)]);
  return evaluateCycle(inputs.readings, { rules, doses: inputs.doses, now, cycleStartedAt: cycleStartedAt ?? undefined });
}
