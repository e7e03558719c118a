import "server-only";
import { and, asc, desc, eq, gt, isNull } from "drizzle-orm";
import { db, type Tx } from "../index";
import { stockingBatches, users, waterTests } from "../schema";
import { getCycleEvaluation } from "./cycle-state";
import { lockProject } from "./water";
import { forbidden, unprocessable, conflict } from "../../server/errors";
import { formatMgL } from "../../lib/cycling/wording";

type ReTest = { status: "zero"; at: Date } | { status: "waiting" } | { status: "showing"; at: Date; ammoniaMgL: number | null; nitriteMgL: number | null };

// The newest reading after `afterMs` that tested both ammonia and nitrite decides: a later
// non-zero reading overrides an earlier zero, because that is what the fish are in now.
async function reTestAfter(conn: Tx | ReturnType<typeof db>, projectId: string, after: Date): Promise<ReTest> {
  const rows = await conn
    .select({ takenAt: waterTests.takenAt, ammoniaMgL: waterTests.ammoniaMgL, nitriteMgL: waterTests.nitriteMgL })
    .from(waterTests)
    .where(and(eq(waterTests.projectId, projectId), isNull(waterTests.voidedAt), gt(waterTests.takenAt, after)))
    .orderBy(desc(waterTests.takenAt), desc(waterTests.createdAt));
  const newest = rows.find((r) => r.ammoniaMgL != null && r.nitriteMgL != null);
  if (!newest) return { status: "waiting" };
  if (newest.ammoniaMgL === 0 && newest.nitriteMgL === 0) return { status: "zero", at: newest.takenAt };
  return { status: "showing", at: newest.takenAt, ammoniaMgL: newest.ammoniaMgL, nitriteMgL: newest.nitriteMgL };
}

/** Batches of fish, oldest first, each with whether the water has re-tested at zero since. */
export async function listStockingBatches(projectId: string) {
  const rows = await db()
    .select({ batch: stockingBatches, byName: users.name })
    .from(stockingBatches)
    .innerJoin(users, eq(users.id, stockingBatches.byUserId))
    .where(eq(stockingBatches.projectId, projectId))
    .orderBy(asc(stockingBatches.addedAt));
  return Promise.all(
    rows.map(async ({ batch, byName }) => ({
      id: batch.id,
      addedAt: batch.addedAt,
      description: batch.description,
      fishCount: batch.fishCount,
      quarantineDays: batch.quarantineDays,
      byName,
      overrideReason: batch.override,
      reTest: await reTestAfter(db(), projectId, batch.addedAt),
    })),
  );
}

export type StockingBatchRow = Awaited<ReturnType<typeof listStockingBatches>>[number];

function reTestReason(reTest: ReTest): string {
  if (reTest.status === "waiting") return "Ammonia and nitrite haven't been tested since the last batch went in; test the water before adding more fish.";
  if (reTest.status !== "showing") return "";
  const shown = [
    (reTest.ammoniaMgL ?? 0) > 0 ? `ammonia at ${formatMgL(reTest.ammoniaMgL as number)}` : "",
    (reTest.nitriteMgL ?? 0) > 0 ? `nitrite at ${formatMgL(reTest.nitriteMgL as number)}` : "",
  ].filter(Boolean);
  return `Ammonia and nitrite must read zero again before the next batch; the latest test shows ${shown.join(" and ")}.`;
}

/**
 * Records a batch of fish. The first needs the cycle gate open; each later one needs ammonia and
 * nitrite back at zero on a test taken after the previous batch. The lead may pass either rule
 * with a written reason, which is kept on the batch.
 */
export async function addStockingBatch(opts: {
  projectId: string;
  /** `canOverride` comes from the permission table (canOnProject "override_gate"). */
  user: { id: string; canOverride: boolean };
  values: { addedAt: Date; description: string; fishCount: number; quarantineDays: number | null; overrideReason: string | null; quarantineWaived?: boolean };
  now?: Date;
  /** Run inside the caller's transaction (a plan batch leaving quarantine records its batch this way). */
  tx?: Tx;
}) {
  const { projectId, user, values } = opts;
  const now = opts.now ?? new Date();
  if (values.overrideReason && !user.canOverride) throw forbidden("Only the lead can add fish past the re-test rule.");
  const run = <T,>(fn: (tx: Tx) => Promise<T>) => (opts.tx ? fn(opts.tx) : db().transaction(fn));
  return run(async (tx) => {
    const project = await lockProject(tx, projectId);
    if (project.stage !== "first_stocking" && project.stage !== "in_service") {
      throw conflict("Fish are recorded from first stocking on; move the project into first stocking first.");
    }
    const [previous] = await tx
      .select({ addedAt: stockingBatches.addedAt })
      .from(stockingBatches)
      .where(eq(stockingBatches.projectId, projectId))
      .orderBy(desc(stockingBatches.addedAt))
      .limit(1);

    let reasons: string[];
    if (!previous) {
      const evaluation = await getCycleEvaluation(projectId, now, tx);
      reasons = evaluation.ready ? [] : evaluation.reasons;
    } else {
      const reTest = await reTestAfter(tx, projectId, previous.addedAt);
      reasons = reTest.status === "zero" ? [] : [reTestReason(reTest)];
    }
    if (reasons.length && !values.overrideReason) {
      const head = previous ? "The next batch has to wait." : "The first batch has to wait for the cycle.";
      throw unprocessable(`${head} ${reasons.join(" ")}`, { reasons, canOverride: user.canOverride });
    }
    const [row] = await tx
      .insert(stockingBatches)
      .values({
        projectId,
        addedAt: values.addedAt,
        description: values.description,
        fishCount: values.fishCount,
        quarantineDays: values.quarantineDays,
        byUserId: user.id,
        // A reason given when no rule was in the way is not an override; don't record it as one.
        override: reasons.length || values.quarantineWaived ? values.overrideReason : null,
      })
      .returning();
    return { batch: row, overridden: reasons.length > 0 || !!values.quarantineWaived, passedReasons: reasons };
  });
}
