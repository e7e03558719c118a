import { differenceInCalendarDays, format } from "date-fns";
import { nextStage, STAGE_BLURBS, STAGE_LABELS, type Stage } from "../stages/stages";

export type UpcomingVisit = { kind: string; startsAt: Date };

/** "in about three weeks" style wording for a date, so a plan doesn't read as a promise. */
export function roughlyWhen(date: Date, now: Date): string {
  const days = differenceInCalendarDays(date, now);
  if (days < 0) return "was planned for " + format(date, "d MMM");
  if (days === 0) return "today";
  if (days === 1) return "tomorrow";
  if (days < 7) return `in ${days} days`;
  if (days < 60) {
    const weeks = Math.round(days / 7);
    return weeks === 1 ? "in about a week" : `in about ${weeks} weeks`;
  }
  const months = Math.round(days / 30);
  return `in about ${months} months`;
}

/** Dates stored as `YYYY-MM-DD` (no time zone) read as midday, so no zone moves them a day. */
export function parsePlainDate(value: string | null | undefined): Date | null {
  if (!value || !/^\d{4}-\d{2}-\d{2}$/.test(value)) return null;
  return new Date(`${value}T12:00:00Z`);
}

export type NextStep = { headline: string; detail: string; when: string | null };

/**
 * What happens next on a project, in words a client can read, and roughly when: the next booked
 * visit first, else the planned install or handover date that still lies ahead.
 */
export function whatHappensNext(opts: {
  stage: Stage;
  targetInstallDate?: string | null;
  targetHandoverDate?: string | null;
  nextVisit?: UpcomingVisit | null;
  now: Date;
}): NextStep {
  const { stage, now } = opts;
  const next = nextStage(stage);
  const headline = next ? `Next: ${STAGE_LABELS[next]}` : "Looking after your tank";
  const detail = next ? STAGE_BLURBS[next] : STAGE_BLURBS.in_service;
  let when: string | null = null;
  if (opts.nextVisit && opts.nextVisit.startsAt >= now) {
    when = `Next visit (${opts.nextVisit.kind}) ${roughlyWhen(opts.nextVisit.startsAt, now)}, on ${format(opts.nextVisit.startsAt, "EEEE d MMMM")}.`;
  } else {
    const install = parsePlainDate(opts.targetInstallDate);
    const handover = parsePlainDate(opts.targetHandoverDate);
    const beforeInstall = ["site_survey", "stand_load_check", "aquascape"].includes(stage);
    if (beforeInstall && install && install >= startOfToday(now)) {
      when = `Install day is planned ${roughlyWhen(install, now)} (${format(install, "d MMMM")}).`;
    } else if (stage !== "in_service" && handover && handover >= startOfToday(now)) {
      when = `Handover is planned ${roughlyWhen(handover, now)} (${format(handover, "d MMMM")}).`;
    }
  }
  return { headline, detail, when };
}

function startOfToday(now: Date): Date {
  return new Date(Date.UTC(now.getUTCFullYear(), now.getUTCMonth(), now.getUTCDate()));
}

/** Numbers from a water-test kit, shown at the kit's resolution: whole numbers above 5, else two places at most. */
function kitValue(v: number): string {
  if (v >= 5) return String(Math.round(v));
  return String(Math.round(v * 100) / 100);
}

/** One line for a water test: "ammonia 0.5 mg/L, nitrite 1 mg/L, nitrate 5 mg/L". */
export function testInWords(t: { ammoniaMgL: number | null; nitriteMgL: number | null; nitrateMgL: number | null }): string {
  const parts: string[] = [];
  const add = (name: string, v: number | null) => {
    if (v === null || v === undefined) return;
    parts.push(v === 0 ? `${name} zero` : `${name} ${kitValue(v)} mg/L`);
  };
  add("ammonia", t.ammoniaMgL);
  add("nitrite", t.nitriteMgL);
  add("nitrate", t.nitrateMgL);
  return parts.length ? parts.join(", ") : "no ammonia, nitrite or nitrate recorded";
}
