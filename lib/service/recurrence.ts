import * as rrulePkg from "rrule";
import { addDays, localDay, zonedInstant } from "./local-dates";

/**
 * Service-visit recurrence. The rule is an RFC 5545 RRULE body; rrule computes it on "floating"
 * dates (midnight UTC standing for a calendar day), and each day is then placed at the plan's local
 * start time in the company's zone, so a 09:00 visit stays at 09:00 on both sides of a clock change.
 *
 * Month-end: "monthly on the 29th, 30th or 31st" clamps to the month's last day in shorter months
 * (the 31st is 30 April and 28 or 29 February), written as BYMONTHDAY=28,…,31;BYSETPOS=-1, so every
 * month has exactly one visit.
 */

// rrule ships CommonJS as its main entry and ESM as "module": bundlers see named exports, plain Node a default.
const { RRule } = ((rrulePkg as unknown as { RRule?: typeof rrulePkg.RRule }).RRule ? rrulePkg : (rrulePkg as unknown as { default: typeof rrulePkg }).default);

export const WEEKDAYS = ["MO", "TU", "WE", "TH", "FR", "SA", "SU"] as const;
export type Weekday = (typeof WEEKDAYS)[number];
export const WEEKDAY_NAMES: Record<Weekday, string> = { MO: "Monday", TU: "Tuesday", WE: "Wednesday", TH: "Thursday", FR: "Friday", SA: "Saturday", SU: "Sunday" };
export const MAX_WEEKS_APART = 12;

export type Recurrence = { kind: "weekly"; everyWeeks: number; weekday: Weekday } | { kind: "monthly"; dayOfMonth: number };

/** The stored RRULE body for a recurrence. */
export function ruleBody(r: Recurrence): string {
  if (r.kind === "weekly") return `FREQ=WEEKLY;INTERVAL=${r.everyWeeks};BYDAY=${r.weekday}`;
  if (r.dayOfMonth <= 28) return `FREQ=MONTHLY;BYMONTHDAY=${r.dayOfMonth}`;
  const days = [];
  for (let d = 28; d <= r.dayOfMonth; d++) days.push(d);
  return `FREQ=MONTHLY;BYMONTHDAY=${days.join(",")};BYSETPOS=-1`;
}

/** Reads back a body written by ruleBody; anything else is null (the plan form only writes these shapes). */
export function parseRule(body: string): Recurrence | null {
  const weekly = /^FREQ=WEEKLY;INTERVAL=(\d{1,2});BYDAY=(MO|TU|WE|TH|FR|SA|SU)$/.exec(body);
  if (weekly) {
    const everyWeeks = Number(weekly[1]);
    return everyWeeks >= 1 && everyWeeks <= MAX_WEEKS_APART ? { kind: "weekly", everyWeeks, weekday: weekly[2] as Weekday } : null;
  }
  const monthly = /^FREQ=MONTHLY;BYMONTHDAY=(\d{1,2})$/.exec(body);
  if (monthly) {
    const d = Number(monthly[1]);
    return d >= 1 && d <= 28 ? { kind: "monthly", dayOfMonth: d } : null;
  }
  const clamped = /^FREQ=MONTHLY;BYMONTHDAY=([\d,]+);BYSETPOS=-1$/.exec(body);
  if (clamped) {
    const days = clamped[1].split(",").map(Number);
    const last = days[days.length - 1];
    const r: Recurrence = { kind: "monthly", dayOfMonth: last };
    return last >= 29 && last <= 31 && ruleBody(r) === body ? r : null;
  }
  return null;
}

const ordinal = (n: number) => {
  const tens = n % 100;
  const suffix = tens >= 11 && tens <= 13 ? "th" : ({ 1: "st", 2: "nd", 3: "rd" } as Record<number, string>)[n % 10] ?? "th";
  return `${n}${suffix}`;
};

/** The interval in words, for the plan, the portal and the e-mail. */
export function describeRecurrence(r: Recurrence): string {
  if (r.kind === "weekly") return r.everyWeeks === 1 ? `Every ${WEEKDAY_NAMES[r.weekday]}` : `Every ${r.everyWeeks} weeks on ${WEEKDAY_NAMES[r.weekday]}`;
  return r.dayOfMonth <= 28 ? `Monthly on the ${ordinal(r.dayOfMonth)}` : `Monthly on the ${ordinal(r.dayOfMonth)} (or the month's last day when shorter)`;
}

export type PlanTiming = { rule: string; startsOn: string; startTime: string; timeZone: string };
export type Occurrence = { occurrenceOn: string; startsAt: Date };

const floating = (date: string) => {
  const [y, m, d] = date.split("-").map(Number);
  return new Date(Date.UTC(y, m - 1, d));
};

/**
 * The series' first day. RFC 5545 counts a weekly INTERVAL from the week holding DTSTART, so a start
 * on a Wednesday for "every 2 weeks on Tuesday" would skip to the Tuesday after next; moving the
 * start to the first matching weekday makes the first visit the first Tuesday on or after the start.
 */
export function seriesStart(rule: string, startsOn: string): string {
  const r = parseRule(rule);
  if (r?.kind !== "weekly") return startsOn;
  const weekday = (floating(startsOn).getUTCDay() + 6) % 7; // Monday = 0, as WEEKDAYS
  const target = WEEKDAYS.indexOf(r.weekday);
  return addDays(startsOn, (target - weekday + 7) % 7);
}

/**
 * The plan's visits whose start falls in [from, to), each as its series date and its instant. The
 * series starts on `startsOn` (the first matching day on or after it).
 */
export function occurrencesBetween(plan: PlanTiming, from: Date, to: Date): Occurrence[] {
  if (!(to.getTime() > from.getTime())) return [];
  const options = RRule.parseString(plan.rule);
  const rule = new RRule({ ...options, dtstart: floating(seriesStart(plan.rule, plan.startsOn)) });
  // A day either side: a local date can start before `from` in UTC terms or after `to`.
  const firstDay = addDays(localDay(from, plan.timeZone), -1);
  const lastDay = addDays(localDay(to, plan.timeZone), 1);
  const out: Occurrence[] = [];
  for (const day of rule.between(floating(firstDay), floating(lastDay), true)) {
    const occurrenceOn = day.toISOString().slice(0, 10);
    const startsAt = zonedInstant(occurrenceOn, plan.startTime, plan.timeZone);
    if (startsAt.getTime() >= from.getTime() && startsAt.getTime() < to.getTime()) out.push({ occurrenceOn, startsAt });
  }
  return out;
}

/** How far ahead a plan's visits are written out as rows: 8 weeks (common practice for rota planning). */
export const MATERIALISE_AHEAD_DAYS = 56;
