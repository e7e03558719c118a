/**
 * Plain-language progress notes for the client portal: no jargon, no
 * numbers a client could misread as a promise.
 */

import { DAY_MS, firstValueSince, latestValue, prepareHistory } from "./cycle-history";
import type { CycleEvaluation } from "./evaluate-cycle";
import type { Analyte, WaterTest } from "./readings";
import { countWord } from "./wording";

/** Direction of one analyte over recent days. */
export type Trend = "rising" | "falling" | "steady" | "unknown";

/**
 * Changes smaller than these are within what one reading can tell apart, so they don't count as a
 * trend (common practice, from memory; independent of the kit a project uses).
 */
export const SMALLEST_TREND_CHANGE_MGL: Readonly<Record<Analyte, number>> = Object.freeze({ ammonia: 0.25, nitrite: 0.25, nitrate: 5 });

/** Options for describeTrend. */
export interface TrendOptions {
  /** How far back from the newest test of that analyte to look. Default 7 days. */
  days?: number;
  /** Smallest change that counts. Default: SMALLEST_TREND_CHANGE_MGL for the analyte. */
  minChangeMgL?: number;
}

/**
 * Compares the newest value of an analyte with the oldest one within
 * `days` before it. "unknown" when fewer than two tests fall in that span.
 * Readings may be unsorted; voided ones are ignored.
 */
export function describeTrend(readings: readonly WaterTest[], analyte: Analyte, options: TrendOptions = {}): Trend {
  const days = options.days ?? 7;
  const minChange = options.minChangeMgL ?? SMALLEST_TREND_CHANGE_MGL[analyte];
  const h = prepareHistory(readings);
  const last = latestValue(h, analyte);
  if (!last) return "unknown";
  const first = firstValueSince(h, analyte, last.time - days * DAY_MS);
  if (!first || first.time === last.time) return "unknown";
  const change = last.value - first.value;
  if (change >= minChange) return "rising";
  if (change <= -minChange) return "falling";
  return "steady";
}

function trendWords(trend: Trend, ifUnknown: string): string {
  return trend === "steady" ? "holding steady" : trend === "unknown" ? ifUnknown : trend;
}

// Remaining-time phrases are common practice for a fishless cycle (four to
// six weeks in all), from memory; worded as "common" so they don't read as a promise.
const FIRST_STAGE_TIME = "About two to four more weeks is common.";
const SECOND_STAGE_TIME = "About one to two more weeks is common.";

/**
 * One or two sentences on where a tank's cycle stands, for clients.
 * `readings` are the same tests the evaluation was made from; they supply
 * the recent trends. Phases: see evaluateCycle.
 */
export function describeCycleForClient(
  result: Pick<CycleEvaluation, "phase" | "rules">,
  readings: readonly WaterTest[],
): string {
  switch (result.phase) {
    case "cycled":
      return "The tank has finished cycling: ammonia and nitrite have read zero on repeat tests. Fish can now go in, a few at a time, with a water test after each batch.";
    case "not-started":
      return readings.some((r) => !r.voided)
        ? "The tank's cycle hasn't started yet: no ammonia has shown up in the water tests so far."
        : "No water tests have been recorded yet; progress will show here once testing starts.";
    case "stalled":
      return `Progress has paused: ammonia and nitrite haven't changed in ${countWord(result.rules.stallDays)} days. We're checking the water chemistry to get it moving again.`;
    case "ammonia-falling": {
      const ammonia = describeTrend(readings, "ammonia");
      const nitrite = describeTrend(readings, "nitrite");
      if (ammonia === "falling" && nitrite === "rising") {
        return `Ammonia is falling, nitrite is rising: the bacteria are establishing. ${FIRST_STAGE_TIME}`;
      }
      const nitriteNow = latestValue(prepareHistory(readings), "nitrite");
      const nitritePart =
        !nitriteNow || nitriteNow.value === 0
          ? "nitrite hasn't appeared yet"
          : `nitrite is ${trendWords(nitrite, "present")}`;
      return `Ammonia is ${trendWords(ammonia, "present")} and ${nitritePart}: the first bacteria are still establishing. ${FIRST_STAGE_TIME}`;
    }
    case "nitrite-falling": {
      const nitriteNow = latestValue(prepareHistory(readings), "nitrite");
      if (!nitriteNow || nitriteNow.value === 0) {
        return "Ammonia and nitrite now read zero; we're confirming with further tests before any fish go in.";
      }
      const nitrite = describeTrend(readings, "nitrite");
      return `Ammonia has cleared and nitrite is ${trendWords(nitrite, "still present")}: the second group of bacteria is catching up. ${SECOND_STAGE_TIME}`;
    }
  }
}
