/**
 * The project's target install date and its booked install-day visits tell one story: booking or
 * moving the visit sets the date, and changing the date moves the visits. Dates are calendar dates
 * in the company's zone, so an early start east of UTC isn't filed under the day before.
 */
import { addDays, daysBetween, localDay, localTime, zonedInstant, type Ymd } from "../service/local-dates";

/** The install date a booked install-day visit stands for: its calendar date where the company works. */
export const installDateOf = (startsAt: Date, timeZone: string): Ymd => localDay(startsAt, timeZone);

export type BookedVisit = { id: string; startsAt: Date };

/**
 * Booked install-day visits moved so the first falls on `to`: each keeps its wall-clock time (09:00
 * stays 09:00 across a clock change) and a multi-day install keeps the days between its visits.
 * Only the visits that change are returned.
 */
export function shiftInstallVisits(booked: BookedVisit[], to: Ymd, timeZone: string): BookedVisit[] {
  if (!booked.length) return [];
  // Stryker disable next-line EqualityOperator: two visits at the same instant give the same first date either way
  const first = booked.reduce((a, b) => (b.startsAt < a.startsAt ? b : a));
  const delta = daysBetween(localDay(first.startsAt, timeZone), to);
  if (delta === 0) return [];
  return booked.map((v) => ({ id: v.id, startsAt: zonedInstant(addDays(localDay(v.startsAt, timeZone), delta), localTime(v.startsAt, timeZone), timeZone) }));
}
