/**
 * The verdict on a cycling tank: which phase it is in, and whether it is
 * ready for fish, with plain reasons for anything still missing.
 */

import { resolveCycleRules, type CycleRules } from "./cycle-rules";
import {
  DAY_MS,
  HOUR_MS,
  isStalled,
  isZeroPair,
  latestValue,
  prepareHistory,
  showsAmmoniaOrNitrite,
  type History,
} from "./cycle-history";
import { READING_LIMITS, type AmmoniaDose, type WaterTest } from "./readings";
import { capitalise, countWord, formatAgo, formatDuration, formatMgL, formatRuleHours, formatRuleSpan } from "./wording";

/** Stable keys for the cycle's phases; show them to people through PHASE_LABELS. */
export type CyclePhase = "not-started" | "ammonia-falling" | "nitrite-falling" | "cycled" | "stalled";

/** Plain labels for each phase. */
export const PHASE_LABELS: Readonly<Record<CyclePhase, string>> = Object.freeze({
  "not-started": "not started",
  "ammonia-falling": "ammonia falling, nitrite rising",
  "nitrite-falling": "nitrite falling",
  cycled: "cycled",
  stalled: "stalled",
});

/** The two ends of the zero run that the readiness rule looked at. */
export interface ZeroPair {
  earlier: WaterTest;
  later: WaterTest;
  hoursApart: number;
}

/** What evaluateCycle concluded. */
export interface CycleEvaluation {
  ready: boolean;
  phase: CyclePhase;
  /** One plain sentence per unmet rule; empty when ready. */
  reasons: string[];
  /** Newest zero reading and the oldest one counted with it; absent unless there are two or more zeros in the run. */
  lastZeroPair?: ZeroPair;
  /** Whole days from the cycle's start (or first reading) to `now` (or the newest reading). */
  daysSinceStart: number | null;
  /** Newest reading that counted. */
  latest?: WaterTest;
  /** The rules applied, defaults included. */
  rules: CycleRules;
}

/** Optional inputs to evaluateCycle. */
export interface EvaluateCycleOptions {
  rules?: Partial<CycleRules>;
  doses?: readonly AmmoniaDose[];
  /** Needed to judge freshness; without it the tank is never called ready. */
  now?: Date;
  /** Readings and doses before this are ignored, e.g. from before a restart. */
  cycleStartedAt?: Date;
}

interface ZeroRun {
  /** Zeros that met the spacing rule, counting back from the newest. */
  counted: number;
  /** Zeros in the run regardless of spacing (only complete up to the point counting stopped). */
  total: number;
  newest: number;
  oldest: number;
  /** Index of the reading where the run was cut off, reported when no zero follows it. */
  breaker: number;
}

// Walking back from the newest test, counting a zero only if it lies far
// enough before the last counted one is optimal (earliest-deadline greedy),
// so no other choice of zeros could satisfy the rule when this one fails.
// Readings that tested neither ammonia nor nitrite, or only one of them at
// zero, neither count nor break the run.
function scanZeroRun(h: History, rules: CycleRules): ZeroRun {
  const minGap = rules.minHoursBetweenZeros * HOUR_MS;
  const run: ZeroRun = { counted: 0, total: 0, newest: -1, oldest: -1, breaker: -1 };
  let lastCounted = Infinity;
  for (let i = h.readings.length - 1; i >= 0; i--) {
    const r = h.readings[i];
    if (showsAmmoniaOrNitrite(r)) {
      run.breaker = i;
      break;
    }
    if (!isZeroPair(r)) continue;
    // Stryker disable next-line EqualityOperator: newest is only 0 once the walk has reached the oldest reading, after which there is no i to store
    if (run.newest < 0) run.newest = i;
    run.oldest = i;
    run.total++;
    if (lastCounted - h.times[i] >= minGap) {
      run.counted++;
      lastCounted = h.times[i];
      if (run.counted >= rules.zeroReadingsNeeded) break;
    }
  }
  return run;
}

function zeroRunReason(h: History, run: ZeroRun, rules: CycleRules): string | undefined {
  const needed = rules.zeroReadingsNeeded;
  if (run.counted >= needed) return undefined;
  if (run.newest < 0) {
    if (run.breaker < 0) return "Ammonia and nitrite haven't both been tested yet.";
    const r = h.readings[run.breaker];
    const shown = [
      (r.ammoniaMgL ?? 0) > 0 ? `ammonia at ${formatMgL(r.ammoniaMgL as number)}` : "",
      (r.nitriteMgL ?? 0) > 0 ? `nitrite at ${formatMgL(r.nitriteMgL as number)}` : "",
    ].filter(Boolean);
    return `Ammonia and nitrite must both read zero; the latest test shows ${shown.join(" and ")}.`;
  }
  const head = `${capitalise(countWord(needed))} zero readings ${formatRuleSpan(rules.minHoursBetweenZeros)} apart are needed`;
  if (run.total > run.counted && needed === 2) {
    const gap = (h.times[run.newest] - h.times[run.oldest]) / HOUR_MS;
    return `${head}; the last one was ${formatDuration(gap)} after the first.`;
  }
  if (run.total > run.counted) {
    return `${head}; only ${countWord(run.counted)} ${run.counted === 1 ? "is" : "are"} far enough apart so far.`;
  }
  return `${head}; there ${run.counted === 1 ? "is only one" : `are only ${countWord(run.counted)}`} so far.`;
}

/** Time of the newest reading that tested both ammonia and nitrite. */
function newestCompleteTime(h: History): number | undefined {
  for (let i = h.readings.length - 1; i >= 0; i--) {
    const r = h.readings[i];
    if (r.ammoniaMgL != null && r.nitriteMgL != null) return h.times[i];
  }
  return undefined;
}

function doseReason(h: History, doseMs: number, refMs: number, rules: CycleRules): string | undefined {
  const deadline = doseMs + rules.clearWithinHoursOfDose * HOUR_MS;
  let tested = false;
  // Strictly after: a test logged at the dose's own time was taken before dosing.
  // Stryker disable next-line ConditionalExpression: at i = -1, h.times[-1] is undefined and "undefined > doseMs" is false, so the loop stops there too
  for (let i = h.readings.length - 1; i >= 0 && h.times[i] > doseMs; i--) {
    if (h.times[i] > deadline) continue;
    const r = h.readings[i];
    if (isZeroPair(r)) return undefined;
    if (r.ammoniaMgL != null || r.nitriteMgL != null) tested = true;
  }
  const ago = formatAgo((refMs - doseMs) / HOUR_MS);
  const within = formatRuleHours(rules.clearWithinHoursOfDose);
  if (refMs < deadline) {
    return `Ammonia was dosed ${ago}; ammonia and nitrite need to read zero within ${within} of the dose.`;
  }
  return tested
    ? `Ammonia was dosed ${ago} and didn't read zero within ${within}.`
    : `Ammonia was dosed ${ago} and wasn't tested within ${within} of it.`;
}

function lastDoseTime(doses: readonly AmmoniaDose[], fromMs = -Infinity): number | undefined {
  let last = -Infinity;
  for (const d of doses) {
    if (d.voided) continue;
    const t = d.dosedAt.getTime();
    if (Number.isNaN(t)) throw new RangeError(`Dose ${d.id} has no valid time.`);
    if (t < fromMs) continue;
    last = Math.max(last, t);
  }
  return last === -Infinity ? undefined : last;
}

function validTime(date: Date | undefined, name: string): number | undefined {
  if (date === undefined) return undefined;
  const t = date.getTime();
  if (Number.isNaN(t)) throw new RangeError(`${name} is not a valid date.`);
  return t;
}

/**
 * Judges a tank's cycle from its water tests (any order; voided ones and
 * those before `cycleStartedAt` are ignored).
 *
 * Ready needs every rule in `rules` to pass, plus the cycle to have started
 * (ammonia or nitrite seen above zero, or a dose logged) and `now` to be
 * given. Phase, when not ready: "not-started" if the cycle hasn't started;
 * "stalled" if ammonia and nitrite haven't changed in `stallDays`
 * (see isStalled); otherwise "ammonia-falling" while the newest ammonia test
 * is above zero (this also covers the first days before ammonia starts to
 * drop), else "nitrite-falling", which includes both at zero awaiting
 * confirmation. Throws RangeError for invalid rules, dates or values.
 */
export function evaluateCycle(readings: readonly WaterTest[], options: EvaluateCycleOptions = {}): CycleEvaluation {
  const rules = resolveCycleRules(options.rules);
  const fromMs = validTime(options.cycleStartedAt, "The cycle start");
  const nowMs = validTime(options.now, "The current time");
  const h = prepareHistory(readings, fromMs, (nowMs ?? Infinity) + READING_LIMITS.futureToleranceMinutes * 60_000);
  const doseMs = lastDoseTime(options.doses ?? [], fromMs);
  const n = h.readings.length;
  const newestMs = h.times.at(-1);
  const refMs = nowMs ?? (doseMs === undefined ? newestMs : Math.max(doseMs, newestMs ?? doseMs));
  const startMs = fromMs ?? h.times.at(0);
  const daysSinceStart =
    refMs === undefined || startMs === undefined ? null : Math.max(0, Math.floor((refMs - startMs) / DAY_MS));
  const latest = h.readings.at(-1);

  if (n === 0) {
    return {
      ready: false,
      phase: doseMs === undefined ? "not-started" : "ammonia-falling",
      reasons: ["No water tests have been recorded yet."],
      daysSinceStart,
      rules,
    };
  }

  const seenAmmoniaOrNitrite = h.readings.some(showsAmmoniaOrNitrite);
  const seenNitrate = h.readings.some((r) => (r.nitrateMgL ?? 0) > 0);
  const started = seenAmmoniaOrNitrite || doseMs !== undefined;

  const reasons: string[] = [];
  if (!started) reasons.push("No ammonia or nitrite has shown up yet: the cycle hasn't started.");

  const run = scanZeroRun(h, rules);
  const runReason = zeroRunReason(h, run, rules);
  if (runReason) reasons.push(runReason);

  if (nowMs === undefined) {
    reasons.push("The current time wasn't given, so the age of the latest test can't be checked.");
  } else {
    // With no complete test at all, the zero-run reason already asks for one.
    const ageHours = (nowMs - (newestCompleteTime(h) ?? nowMs)) / HOUR_MS;
    if (ageHours > rules.maxAgeHoursOfLatest) {
      reasons.push(`The latest ammonia and nitrite test is ${formatDuration(ageHours)} old; take a new one.`);
    }
  }

  if (rules.requireNitrate && !seenNitrate) {
    reasons.push("No nitrate has been seen yet: nitrification isn't proven.");
  }

  if (doseMs !== undefined) {
    const reason = doseReason(h, doseMs, refMs as number, rules);
    if (reason) reasons.push(reason);
  }

  const ready = reasons.length === 0;
  let phase: CyclePhase;
  if (ready) phase = "cycled";
  else if (!started) phase = "not-started";
  else if (isStalled(h, refMs as number, rules.stallDays, rules.stallChangeMgL)) phase = "stalled";
  else {
    const ammonia = latestValue(h, "ammonia");
    const nitrite = latestValue(h, "nitrite");
    const ammoniaPresent = ammonia ? ammonia.value > 0 : nitrite === undefined;
    phase = ammoniaPresent ? "ammonia-falling" : "nitrite-falling";
  }

  const result: CycleEvaluation = { ready, phase, reasons, daysSinceStart, latest, rules };
  // Both are -1 when the run has no zero, and equal when it has one.
  if (run.oldest !== run.newest) {
    result.lastZeroPair = {
      earlier: h.readings[run.oldest],
      later: h.readings[run.newest],
      hoursApart: (h.times[run.newest] - h.times[run.oldest]) / HOUR_MS,
    };
  }
  return result;
}
