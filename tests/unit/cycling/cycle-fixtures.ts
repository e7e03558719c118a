// Builders for invented cycle data shared by the cycling tests.
import type { AmmoniaDose, WaterTest } from "@/lib/cycling/readings";

/** Day 0 of every invented cycle, 08:00 UTC: staff test first thing, then dose. */
export const T0 = Date.UTC(2025, 2, 1, 8, 0, 0);
export const HOUR = 3_600_000;
export const DAY = 24 * HOUR;

/** A moment `days` (and `hours`) after T0. */
export function at(days: number, hours = 0): Date {
  return new Date(T0 + days * DAY + hours * HOUR);
}

let counter = 0;

/** A reading with no results unless given; ids are unique and sort in creation order. */
export function reading(takenAt: Date, values: Partial<Omit<WaterTest, "takenAt">> = {}): WaterTest {
  counter += 1;
  return {
    id: `r${String(counter).padStart(6, "0")}`,
    takenAt,
    ammoniaMgL: null,
    nitriteMgL: null,
    nitrateMgL: null,
    pH: null,
    tempC: null,
    ...values,
  };
}

/** A zero ammonia, zero nitrite reading with some nitrate: what a finished cycle looks like. */
export function zero(takenAt: Date, nitrateMgL = 20, extra: Partial<WaterTest> = {}): WaterTest {
  return reading(takenAt, { ammoniaMgL: 0, nitriteMgL: 0, nitrateMgL, pH: 7.6, tempC: 25, ...extra });
}

/** A logged dose. */
export function dose(dosedAt: Date, targetMgL = 2, voided = false): AmmoniaDose {
  counter += 1;
  return { id: `d${String(counter).padStart(6, "0")}`, dosedAt, targetMgL, voided };
}

// Invented daily results for a 35-day fishless cycle (day 0 is the tap-water
// check before the first dose): ammonia held at 2 then falling to zero by
// day 14, nitrite peaking mid-cycle and back to zero on days 33–34, nitrate
// climbing once nitrite is being converted.
const AMMONIA = [0, 2, 2, 2, 2, 2, 1, 1, 1, 0.5, 0.5, 0.5, 0.25, 0.25];
const NITRITE = [
  0, 0, 0, 0.25, 0.25, 0.5, 0.5, 1, 1, 2, 2, 5, 5, 5, 5, 5, 5, 2, 2, 2, 2, 1, 1, 1, 1, 0.5, 0.5, 0.5, 0.25, 0.25,
  0.25, 0.25, 0.25, 0, 0,
];

/** The whole invented cycle, one reading per day, day 0 to day 34. */
export function wholeCycle(): WaterTest[] {
  return NITRITE.map((nitrite, day) =>
    reading(at(day), {
      ammoniaMgL: AMMONIA[day] ?? 0,
      nitriteMgL: nitrite,
      nitrateMgL: day < 10 ? 0 : Math.min(80, (day - 9) * 5),
      pH: 7.8,
      tempC: 26,
      khDkh: 6,
    }),
  );
}
