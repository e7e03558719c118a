import { waterTests } from "../schema";
import type { FeatureSeed } from "./demo-features";

const HOUR = 3600 * 1000;
const DAY = 24 * HOUR;

/**
 * Invented service-visit tests for the surgery corridor tank, in service for 150 days (see
 * demo-projects.ts): a weekly visit tests the water, changes 30 % with tap water holding 5 mg/L of
 * nitrate, and tests again. Nitrate rises a little faster as the fish grow; the temperature follows
 * the seasons; pH sags between changes. Demo data only, rounded as a kit would read it.
 */
export const seedDemoServiceWater: FeatureSeed = async (tx, { now, projectIds: p, peopleIds: u }) => {
  const projectId = p["ashdown-surgery"];
  const rows: (typeof waterTests.$inferInsert)[] = [];
  let nitrate = 12;
  for (let week = 0; week < 20; week++) {
    const visit = new Date(now.getTime() - (140 - week * 7) * DAY);
    visit.setUTCHours(10, 0, 0, 0);
    const rise = 1 + week * 0.02;
    nitrate += rise * 7;
    const tempC = Math.round((25 + 0.8 * Math.sin((week / 20) * Math.PI)) * 10) / 10;
    const before = { projectId, takenBy: u.crew2, ammoniaMgL: 0, nitriteMgL: 0, tempC, khDkh: 5 };
    rows.push({ ...before, takenAt: visit, createdAt: visit, nitrateMgL: Math.round(nitrate), pH: 7.4, notes: "Before the water change" });
    nitrate = 0.7 * nitrate + 0.3 * 5;
    const after = new Date(visit.getTime() + 1.5 * HOUR);
    rows.push({ projectId, takenBy: u.crew2, takenAt: after, createdAt: after, nitrateMgL: Math.round(nitrate), pH: 7.6, tempC, notes: "After a 30 % change" });
  }
  await tx.insert(waterTests).values(rows);
};
