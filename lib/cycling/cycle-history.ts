/**
 * Sorting and scanning of a tank's readings, shared by the cycle verdict,
 * the stall warning and the client summary so they never disagree.
 */

import type { Analyte, WaterTest } from "./readings";

/** Milliseconds in an hour. */
export const HOUR_MS = 3_600_000;
/** Milliseconds in a day. */
export const DAY_MS = 24 * HOUR_MS;

/** Readings that count, oldest first, with their times pulled out once so later passes avoid Date calls. */
export interface History {
  readings: WaterTest[];
  times: number[];
}

const VALUE_KEYS = ["ammoniaMgL", "nitriteMgL", "nitrateMgL"] as const;

// Ids are unique, so a === b only when the sort compares a reading with itself.
function compareIds(a: string, b: string): number {
  // Stryker disable next-line EqualityOperator,ConditionalExpression: differs only at a === b, which for unique ids is a reading compared with itself and never moves it
  return a < b ? -1 : a > b ? 1 : 0;
}

/**
 * Drops voided readings and those before `fromMs`, and sorts the rest oldest
 * first (ties by id, so the result never depends on input order). Skips the
 * sort when the input is already in order, as it usually is from a query.
 * Throws RangeError for an invalid time or a negative/non-numeric value:
 * silently skipping one could hide a non-zero result and pass a tank early.
 */
export function prepareHistory(input: readonly WaterTest[], fromMs = -Infinity, toMs = Infinity): History {
  const kept: WaterTest[] = [];
  const times: number[] = [];
  // The in-order check only decides whether to sort: sorting input that is already in
  // (time, id) order gives the same result, so a change that makes it sort more often
  // changes nothing but speed.
  // Stryker disable next-line BooleanLiteral: starting "out of order" only sorts sorted input, same result
  let inOrder = true;
  // Stryker disable next-line UnaryOperator: +Infinity only marks the first reading out of order, so sorted input is sorted again, same result
  let prevTime = -Infinity;
  // Stryker disable next-line StringLiteral: prevId is only read when a time equals prevTime, which the first reading's time (finite) never does
  let prevId = "";
  for (const r of input) {
    if (r.voided) continue;
    const t = r.takenAt.getTime();
    if (Number.isNaN(t)) throw new RangeError(`Reading ${r.id} has no valid time.`);
    if (t < fromMs) continue;
    // A reading dated after now (beyond clock drift) is a typo or a wrong clock: it never counts as the latest.
    if (t > toMs) continue;
    for (const key of VALUE_KEYS) {
      const v = r[key];
      if (v != null && !(v >= 0 && v < Infinity)) {
        throw new RangeError(`Reading ${r.id} has an impossible ${key} value (${v}).`);
      }
    }
    // Stryker disable next-line EqualityOperator,LogicalOperator,ConditionalExpression: the survivors only mark in-order input out of order, which sorts it again to the same result
    if (t < prevTime || (t === prevTime && r.id < prevId)) inOrder = false;
    kept.push(r);
    times.push(t);
    prevTime = t;
    prevId = r.id;
  }
  return inOrder ? { readings: kept, times } : sortByTime(kept, times);
}

// A comparator sort of 10,000 objects takes several ms on a small server;
// packing (time offset, index) into one float and using the engine's native
// numeric sort is about three times faster. Date times are whole ms, and
// `slots` is a power of two, so packing and unpacking are exact while the
// key stays below 2^53 (a span of about 17 years for 10,000 readings);
// beyond that the comparator sort takes over.
function sortByTime(kept: WaterTest[], times: number[]): History {
  const n = kept.length;
  // Everything from here to the packed sort only chooses between two sorts that give the
  // same order; a change that picks the comparator sort more often changes nothing but speed.
  let min = Infinity;
  // Stryker disable next-line UnaryOperator: max = +Infinity only sends every input to the comparator sort, same order
  let max = -Infinity;
  for (const t of times) {
    // Stryker disable next-line EqualityOperator: t <= min stores the same value again
    if (t < min) min = t;
    // Stryker disable next-line EqualityOperator: t >= max stores the same value again
    if (t > max) max = t;
  }
  let slots = 1;
  // Stryker disable next-line EqualityOperator: twice the slots still unpack exactly while the check below holds, or fall back to the comparator sort
  while (slots < n) slots *= 2;
  // Stryker disable next-line ConditionalExpression,EqualityOperator: "true" only sends all input to the comparator sort (same order); ">=" differs only when an even product equals the odd MAX_SAFE_INTEGER, which never happens
  if ((max - min + 1) * slots > Number.MAX_SAFE_INTEGER) {
    const order = kept.map((_, i) => i);
    order.sort((a, b) => times[a] - times[b] || compareIds(kept[a].id, kept[b].id));
    return { readings: order.map((i) => kept[i]), times: order.map((i) => times[i]) };
  }

  const keys = new Float64Array(n);
  // Stryker disable next-line EqualityOperator: writing keys[n] past a typed array's end is ignored
  for (let i = 0; i < n; i++) keys[i] = (times[i] - min) * slots + i;
  keys.sort();
  // Stryker disable next-line ArrayDeclaration: every index is written below, so the initial length changes nothing
  const readings = new Array<WaterTest>(n);
  // Stryker disable next-line ArrayDeclaration: every index is written below, so the initial length changes nothing
  const sortedTimes = new Array<number>(n);
  for (let i = 0; i < n; i++) {
    const j = keys[i] % slots;
    readings[i] = kept[j];
    sortedTimes[i] = times[j];
  }
  // Equal times came out in input order; put them in id order so input order never matters.
  // Stryker disable next-line EqualityOperator: at start === n the group is empty past the end and nothing is written
  for (let start = 0; start < n; ) {
    let end = start + 1;
    // Stryker disable next-line ConditionalExpression,EqualityOperator: sortedTimes[n] is undefined, never equal to a time, so the scan stops at n all the same
    while (end < n && sortedTimes[end] === sortedTimes[start]) end++;
    // Stryker disable next-line ConditionalExpression,EqualityOperator,ArithmeticOperator: sorting a group of one reading leaves it as it is
    if (end - start > 1) {
      const group = readings.slice(start, end).sort((a, b) => compareIds(a.id, b.id));
      for (let k = 0; k < group.length; k++) readings[start + k] = group[k];
    }
    start = end;
  }
  return { readings, times: sortedTimes };
}

/** True when a reading shows ammonia or nitrite above zero. */
export function showsAmmoniaOrNitrite(r: WaterTest): boolean {
  return (r.ammoniaMgL ?? 0) > 0 || (r.nitriteMgL ?? 0) > 0;
}

/** True when a reading tested both ammonia and nitrite and both read zero. */
export function isZeroPair(r: WaterTest): boolean {
  return r.ammoniaMgL === 0 && r.nitriteMgL === 0;
}

const FIELD: Readonly<Record<Analyte, "ammoniaMgL" | "nitriteMgL" | "nitrateMgL">> = {
  ammonia: "ammoniaMgL",
  nitrite: "nitriteMgL",
  nitrate: "nitrateMgL",
};

/** The newest tested value of one analyte with its time, or undefined if it was never tested. */
export function latestValue(h: History, analyte: Analyte): { value: number; time: number } | undefined {
  const key = FIELD[analyte];
  for (let i = h.readings.length - 1; i >= 0; i--) {
    const v = h.readings[i][key];
    if (v != null) return { value: v, time: h.times[i] };
  }
  return undefined;
}

/** The oldest tested value of one analyte taken at or after `fromMs`. */
export function firstValueSince(h: History, analyte: Analyte, fromMs: number): { value: number; time: number } | undefined {
  const key = FIELD[analyte];
  let found: { value: number; time: number } | undefined;
  // Stryker disable next-line ConditionalExpression: at i = -1, h.times[-1] is undefined and "undefined >= fromMs" is false, so the loop stops there too
  for (let i = h.readings.length - 1; i >= 0 && h.times[i] >= fromMs; i--) {
    const v = h.readings[i][key];
    if (v != null) found = { value: v, time: h.times[i] };
  }
  return found;
}

/**
 * Whether ammonia and nitrite have sat still for `stallDays` up to `refMs`.
 *
 * Our definition: the newest ammonia/nitrite test still shows one of them
 * above zero; there is a test at or before the window's start (so the
 * history is long enough to judge) and at least one inside it; and across
 * that baseline and the window, neither ammonia nor nitrite varied by
 * `changeMgL` or more. A tank reading zero/zero is waiting for
 * confirmation, not stalled. Ammonia bouncing between doses counts as
 * change, so tests logged straight after dosing can hide a stall.
 */
export function isStalled(h: History, refMs: number, stallDays: number, changeMgL: number): boolean {
  const windowStart = refMs - stallDays * DAY_MS;
  let minA = Infinity;
  let maxA = -Infinity;
  let minN = Infinity;
  let maxN = -Infinity;
  let newestSeen = false;
  let inWindow = 0;
  for (let i = h.readings.length - 1; i >= 0; i--) {
    const r = h.readings[i];
    if (r.ammoniaMgL == null && r.nitriteMgL == null) continue;
    if (!newestSeen) {
      if (!showsAmmoniaOrNitrite(r)) return false;
      newestSeen = true;
    }
    if (r.ammoniaMgL != null) {
      minA = Math.min(minA, r.ammoniaMgL);
      maxA = Math.max(maxA, r.ammoniaMgL);
    }
    if (r.nitriteMgL != null) {
      minN = Math.min(minN, r.nitriteMgL);
      maxN = Math.max(maxN, r.nitriteMgL);
    }
    if (maxA - minA >= changeMgL || maxN - minN >= changeMgL) return false;
    if (h.times[i] <= windowStart) return inWindow > 0;
    inWindow++;
  }
  return false;
}
