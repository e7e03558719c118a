/**
 * Warnings raised by a single water test, and by a cycle that has stopped
 * moving. Levels: "danger" means act today; "caution" means watch closely.
 */

import { DEFAULT_CYCLE_RULES } from "./cycle-rules";
import { isStalled, prepareHistory } from "./cycle-history";
import { AMMONIA_TEMP_RANGE_C, freeAmmoniaMgL } from "./free-ammonia";
import type { WaterTest } from "./readings";
import { formatMgL } from "./wording";

/** How urgent a warning is. */
export type WarningLevel = "danger" | "caution";

/** Stable key per kind of warning, for de-duplicating and styling. */
export type WarningCode = "free-ammonia" | "ammonia-share-unknown" | "nitrite" | "low-ph" | "low-kh" | "stall";

/** One warning for staff. */
export interface CycleWarning {
  level: WarningLevel;
  code: WarningCode;
  message: string;
}

/**
 * Thresholds for warnings.
 *
 * Free ammonia (mg/L NH3): 0.02 chronic concern, 0.05 acute concern.
 * Common practice in fishkeeping and aquaculture, from memory: 0.02 mg/L
 * NH3 is the older US EPA (1976) "Quality Criteria for Water" figure; the
 * US EPA 1999 update and 2013 freshwater ammonia criteria documents now
 * express limits as total ammonia depending on pH and temperature, and are
 * background here rather than the source of these numbers.
 * Nitrite 0.5 mg/L with fish in: common practice. pH 6.5: nitrifying
 * bacteria slow markedly below it (common practice, from memory). KH 2 dKH:
 * below it pH can crash and stall the cycle (common practice).
 */
export const WARNING_THRESHOLDS = Object.freeze({
  freeAmmoniaCautionMgL: 0.02,
  freeAmmoniaDangerMgL: 0.05,
  nitriteDangerMgL: 0.5,
  lowPH: 6.5,
  lowKhDkh: 2,
});

/** The parts of a reading the warnings look at. */
export type WarningReading = Pick<WaterTest, "ammoniaMgL" | "nitriteMgL" | "pH" | "tempC" | "khDkh" | "voided">;

function canComputeFreeAmmonia(pH: number | null, tempC: number | null): boolean {
  return (
    pH != null && pH >= 0 && pH <= 14 &&
    tempC != null && tempC >= AMMONIA_TEMP_RANGE_C.min && tempC <= AMMONIA_TEMP_RANGE_C.max
  );
}

function roughly(value: number): string {
  return String(Number(value.toPrecision(2)));
}

/**
 * Warnings for one water test. Ammonia and nitrite only matter to fish, so
 * they warn only when `fishPresent` (a fishless cycle runs them high on
 * purpose); low pH and KH warn either way because they stall the bacteria.
 * Voided readings and out-of-range values give no warnings: validateReading
 * reports those.
 */
export function readingWarnings(reading: WarningReading, { fishPresent }: { fishPresent: boolean }): CycleWarning[] {
  if (reading.voided) return [];
  const out: CycleWarning[] = [];
  const { pH, tempC, khDkh } = reading;
  // Not tested reads as nothing to warn about.
  const ammoniaMgL = reading.ammoniaMgL ?? 0;
  const nitriteMgL = reading.nitriteMgL ?? 0;

  if (fishPresent && ammoniaMgL > 0) {
    if (canComputeFreeAmmonia(pH, tempC)) {
      const free = freeAmmoniaMgL(ammoniaMgL, pH as number, tempC as number);
      const where = `free ammonia is about ${roughly(free)} mg/L NH3 at pH ${pH} and ${tempC} °C`;
      if (free >= WARNING_THRESHOLDS.freeAmmoniaDangerMgL) {
        out.push({
          level: "danger",
          code: "free-ammonia",
          message: `With fish in the water, ${where}: harmful to fish. A water change is the usual first step.`,
        });
      } else if (free >= WARNING_THRESHOLDS.freeAmmoniaCautionMgL) {
        out.push({
          level: "caution",
          code: "free-ammonia",
          message: `With fish in the water, ${where}: enough to stress fish over days. Retest tomorrow and add no more fish.`,
        });
      }
    } else {
      out.push({
        level: "caution",
        code: "ammonia-share-unknown",
        message: `Ammonia reads ${formatMgL(ammoniaMgL)} with fish in the water; add pH and temperature to see how much of it is the toxic form.`,
      });
    }
  }

  if (fishPresent && nitriteMgL >= WARNING_THRESHOLDS.nitriteDangerMgL) {
    out.push({
      level: "danger",
      code: "nitrite",
      message: `Nitrite is ${formatMgL(nitriteMgL)} with fish in the water: harmful to fish. A water change is the usual first step.`,
    });
  }

  if (pH != null && pH >= 0 && pH < WARNING_THRESHOLDS.lowPH) {
    out.push({
      level: "caution",
      code: "low-ph",
      message: `pH is ${pH}: the bacteria slow down a lot below about ${WARNING_THRESHOLDS.lowPH}, so the cycle may stall.`,
    });
  }

  if (khDkh != null && khDkh >= 0 && khDkh < WARNING_THRESHOLDS.lowKhDkh) {
    out.push({
      level: "caution",
      code: "low-kh",
      message: `KH is ${khDkh} dKH: too little buffer, so pH can drop and stall the cycle.`,
    });
  }
  return out;
}

/**
 * A caution when ammonia and nitrite haven't changed meaningfully in
 * `stallDays` up to `now` (see isStalled in cycle-history.ts for the exact
 * test). Readings may be unsorted; voided ones are ignored. Null if moving.
 */
export function stallWarning(
  readings: readonly WaterTest[],
  now: Date,
  stallDays: number = DEFAULT_CYCLE_RULES.stallDays,
  stallChangeMgL: number = DEFAULT_CYCLE_RULES.stallChangeMgL,
): CycleWarning | null {
  const h = prepareHistory(readings);
  if (!isStalled(h, now.getTime(), stallDays, stallChangeMgL)) return null;
  return {
    level: "caution",
    code: "stall",
    message: `Ammonia and nitrite haven't changed in ${stallDays} days: the cycle may have stalled. Check pH, KH and temperature.`,
  };
}
