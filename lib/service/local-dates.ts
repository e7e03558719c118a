/**
 * Calendar dates and wall-clock times in the company's own time zone, with nothing but Intl. A date is kept as "YYYY-MM-DD" (the shape of a
 * Postgres `date`), and arithmetic on it is done at UTC midnight, where every day has 24 hours, so
 * adding days never slips across a daylight-saving change.
 */
export type Ymd = string;

const DAY_MS = 86_400_000;
const YMD = /^(\d{4})-(\d{2})-(\d{2})$/;

function toUtcMs(day: Ymd): number {
  const m = YMD.exec(day);
  if (!m) throw new RangeError(`Not a calendar date: ${day}`);
  return Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3]));
}

const fromUtcMs = (ms: number): Ymd => new Date(ms).toISOString().slice(0, 10);

/** The date `n` days after `day` (before it when `n` is negative). */
export function addDays(day: Ymd, n: number): Ymd {
  return fromUtcMs(toUtcMs(day) + n * DAY_MS);
}

/** Whole days from `from` to `to`: positive when `to` is later. */
export function daysBetween(from: Ymd, to: Ymd): number {
  return Math.round((toUtcMs(to) - toUtcMs(from)) / DAY_MS);
}

const formatters = new Map<string, Intl.DateTimeFormat>();
function formatter(timeZone: string): Intl.DateTimeFormat {
  let f = formatters.get(timeZone);
  if (!f) {
    f = new Intl.DateTimeFormat("en-CA", { timeZone, year: "numeric", month: "2-digit", day: "2-digit", hour: "2-digit", minute: "2-digit", second: "2-digit", hourCycle: "h23" });
    formatters.set(timeZone, f);
  }
  return f;
}

function wallClock(instant: Date, timeZone: string) {
  const parts = Object.fromEntries(formatter(timeZone).formatToParts(instant).map((p) => [p.type, p.value]));
  return { day: `${parts.year}-${parts.month}-${parts.day}` as Ymd, hour: Number(parts.hour), minute: Number(parts.minute), second: Number(parts.second) };
}

/** The calendar date an instant falls on in `timeZone`. */
export function localDay(instant: Date, timeZone: string): Ymd {
  return wallClock(instant, timeZone).day;
}

/** The wall-clock time ("HH:MM") an instant shows in `timeZone`. */
export function localTime(instant: Date, timeZone: string): string {
  const w = wallClock(instant, timeZone);
  return `${String(w.hour).padStart(2, "0")}:${String(w.minute).padStart(2, "0")}`;
}

/** Milliseconds `timeZone` is ahead of UTC at that instant. */
export function zoneOffsetMs(instant: Date, timeZone: string): number {
  const w = wallClock(instant, timeZone);
  const shown = toUtcMs(w.day) + w.hour * 3_600_000 + w.minute * 60_000 + w.second * 1000;
  return shown - Math.floor(instant.getTime() / 1000) * 1000;
}

/**
 * The instant the clocks in `timeZone` read `time` ("09:00") on `day`. A time skipped by a
 * spring-forward change (02:30 on the night clocks jump from 02:00 to 03:00) comes out one hour
 * later, as a wall clock would show; a time met twice in autumn takes the first. Noon ("12:00") is
 * the safe time for a date entered without one: it is the same calendar date in every zone from
 * UTC−12 to UTC+14.
 */
export function zonedInstant(day: Ymd, time: string, timeZone: string): Date {
  const [hh, mm] = time.split(":").map(Number);
  const wall = toUtcMs(day) + hh * 3_600_000 + mm * 60_000;
  // The offsets a day either side cover any one change; a real zone never changes twice in two days.
  const before = wall - zoneOffsetMs(new Date(wall - DAY_MS), timeZone);
  const after = wall - zoneOffsetMs(new Date(wall + DAY_MS), timeZone);
  const shows = (t: number) => t + zoneOffsetMs(new Date(t), timeZone) === wall;
  const valid = [before, after].filter(shows);
  if (valid.length) return new Date(Math.min(...valid));
  // In the gap: read on the old offset, which lands after the jump.
  return new Date(before);
}

/** The Monday on or before `day` (weeks run Monday to Sunday). */
export function weekStart(day: Ymd): Ymd {
  const weekday = new Date(toUtcMs(day)).getUTCDay(); // 0 is Sunday
  return addDays(day, -((weekday + 6) % 7));
}

/** True when `zone` is a time zone this runtime knows (an IANA name such as "UTC" or "Area/City"). */
export function isKnownTimeZone(zone: string): boolean {
  if (!zone || zone.length > 64) return false;
  try {
    new Intl.DateTimeFormat("en", { timeZone: zone });
  } catch {
    return false;
  }
  return zone === "UTC" || Intl.supportedValuesOf("timeZone").includes(zone);
}

/** "Mon 7 Dec", for a heading or a line. */
export function dayLabel(day: Ymd): string {
  return new Date(toUtcMs(day)).toLocaleDateString("en-GB", { weekday: "short", day: "numeric", month: "short", timeZone: "UTC" });
}

/** "29 Oct 2026", for a calendar date on a line. */
export function dateWords(day: Ymd): string {
  return new Date(toUtcMs(day)).toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });
}
