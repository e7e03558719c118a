import type { DoseRow, WaterTestRow } from "@/db/queries/water";
import type { StockingBatchRow } from "@/db/queries/stocking";

/** Rows as plain data for client components (times as ISO strings). */
export type ReadingView = ReturnType<typeof toReadingView>;
export type DoseView = ReturnType<typeof toDoseView>;
export type BatchView = ReturnType<typeof toBatchView>;

export function toReadingView(t: WaterTestRow) {
  return {
    id: t.id,
    takenAt: t.takenAt.toISOString(),
    ammoniaMgL: t.ammoniaMgL,
    nitriteMgL: t.nitriteMgL,
    nitrateMgL: t.nitrateMgL,
    pH: t.pH,
    tempC: t.tempC,
    khDkh: t.khDkh,
    notes: t.notes,
    takenByName: t.takenBy.name,
    freeAmmoniaMgL: t.freeAmmoniaMgL,
    corrects: t.correctsId !== null,
    voided: t.voided,
    voidedByName: t.voidedByName,
    voidReason: t.voidReason,
  };
}

export function toDoseView(d: DoseRow) {
  return {
    id: d.id,
    dosedAt: d.dosedAt.toISOString(),
    targetMgL: d.targetMgL,
    amountMl: d.amountMl,
    sourcePercent: d.sourcePercent,
    notes: d.notes,
    byName: d.byName,
    voided: d.voided,
    voidReason: d.voidReason,
  };
}

export function toBatchView(b: StockingBatchRow) {
  const r = b.reTest;
  return {
    id: b.id,
    addedAt: b.addedAt.toISOString(),
    description: b.description,
    fishCount: b.fishCount,
    quarantineDays: b.quarantineDays,
    byName: b.byName,
    overrideReason: b.overrideReason,
    reTest:
      r.status === "waiting"
        ? { status: r.status }
        : r.status === "zero"
          ? { status: r.status, at: r.at.toISOString() }
          : { status: r.status, at: r.at.toISOString(), ammoniaMgL: r.ammoniaMgL, nitriteMgL: r.nitriteMgL },
  };
}

/** A reading as the kit gave it: no float noise, no invented precision. */
export function formatReading(value: number | null | undefined): string {
  if (value == null) return "–";
  return String(Number(value.toFixed(3)));
}
