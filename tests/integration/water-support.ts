/** Readings written straight to the database, to set a tank's history up quickly. */
import { db } from "@/db";
import { waterTests } from "@/db/schema";

export const HOUR = 3_600_000;
export const hoursAgo = (h: number) => new Date(Date.now() - h * HOUR);

type Row = { hoursAgo: number; ammonia: number | null; nitrite: number | null; nitrate?: number | null; pH?: number | null };

export async function insertReadings(projectId: string, takenBy: string, rows: Row[]) {
  if (!rows.length) return;
  await db()
    .insert(waterTests)
    .values(
      rows.map((r) => ({
        projectId,
        takenBy,
        takenAt: hoursAgo(r.hoursAgo),
        ammoniaMgL: r.ammonia,
        nitriteMgL: r.nitrite,
        nitrateMgL: r.nitrate ?? null,
        pH: r.pH ?? 7.6,
        tempC: 25,
      })),
    );
}

/** A fishless cycle that has run its course up to one zero reading `lastZeroHoursAgo` hours ago. */
export async function nearlyCycled(projectId: string, takenBy: string, lastZeroHoursAgo = 30) {
  await insertReadings(projectId, takenBy, [
    { hoursAgo: 24 * 20, ammonia: 2, nitrite: 0, nitrate: 0 },
    { hoursAgo: 24 * 12, ammonia: 0.5, nitrite: 2, nitrate: 5 },
    { hoursAgo: 24 * 5, ammonia: 0, nitrite: 0.5, nitrate: 20 },
    { hoursAgo: lastZeroHoursAgo, ammonia: 0, nitrite: 0, nitrate: 40 },
  ]);
}
