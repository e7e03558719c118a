/**
 * Wall-clock times in an IANA time zone, with nothing but Intl. A date and a local time become an
 * instant by asking the zone's offset at a first guess and once more at the result, which settles
 * across a daylight-saving change.
 */

const formatters = new Map<string, Intl.DateTimeFormat>();

function formatter(timeZone: string): Intl.DateTimeFormat {
  let f = formatters.get(timeZone);
  if (!f) {
    f = new Intl.DateTimeFormat("en-US", {
      timeZone,
      hourCycle: "h23",
      year: "numeric",
      month: "2-digit",
      day: "2-digit",
      hour: "2-digit",
      minute: "2-digit",
      second: "2-digit",
    });
    formatters.set(timeZone, f);
  }
  return f;
}

/** True for a zone name this runtime knows ("Europe/…", "America/…", "UTC"). */
export function isTimeZone(name: string): boolean {
  try {
    formatter(name);
    return true;
  } catch {
    return false;
  }
}

type Parts = { year: number; month: number; day: number; hour: number; minute: number; second: number };

function partsIn(instant: Date, timeZone: string): Parts {
  const out: Record<string, number> = {};
  for (const p of formatter(timeZone).formatToParts(instant)) if (p.type !== "literal") out[p.type] = Number(p.value);
  return { year: out.year, month: out.month, day: out.day, hour: out.hour % 24, minute: out.minute, second: out.second };
}

/** Milliseconds the zone is ahead of UTC at that instant. */
export function zoneOffsetMs(instant: Date, timeZone: string): number {
  const p = partsIn(instant, timeZone);
  const asUtc = Date.UTC(p.year, p.month - 1, p.day, p.hour, p.minute, p.second);
  return asUtc - Math.floor(instant.getTime() / 1000) * 1000;
}

/**
 * The instant a local date ("2027-03-28") and time ("09:00") name in the zone. A time skipped by a
 * spring-forward change (02:30 on the night clocks jump from 02:00 to 03:00) comes out one hour
 * later, as a wall clock would show; a time met twice in autumn takes the first.
 */
export function zonedInstant(date: string, time: string, timeZone: string): Date {
  const [y, m, d] = date.split("-").map(Number);
  const [hh, mm] = time.split(":").map(Number);
  const wall = Date.UTC(y, m - 1, d, hh, mm);
  const day = 86_400_000;
  // The offsets a day either side cover any one change; a real zone never changes twice in two days.
  const before = wall - zoneOffsetMs(new Date(wall - day), timeZone);
  const after = wall - zoneOffsetMs(new Date(wall + day), timeZone);
  const shows = (t: number) => t + zoneOffsetMs(new Date(t), timeZone) === wall;
  const valid = [before, after].filter(shows);
  if (valid.length) return new Date(Math.min(...valid));
  // In the gap: read on the old offset, which lands after the jump.
  return new Date(before);
}

/** The local calendar date ("YYYY-MM-DD") of an instant in the zone. */
export function localDate(instant: Date, timeZone: string): string {
  const p = partsIn(instant, timeZone);
  return `${p.year}-${String(p.month).padStart(2, "0")}-${String(p.day).padStart(2, "0")}`;
}

/** The local wall-clock time ("HH:MM") of an instant in the zone. */
export function localTime(instant: Date, timeZone: string): string {
  const p = partsIn(instant, timeZone);
  return `${String(p.hour).padStart(2, "0")}:${String(p.minute).padStart(2, "0")}`;
}

/** Adds whole days to a "YYYY-MM-DD" date. */
export function addDays(date: string, days: number): string {
  const [y, m, d] = date.split("-").map(Number);
  return new Date(Date.UTC(y, m - 1, d + days)).toISOString().slice(0, 10);
}
