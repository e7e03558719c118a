import { ammoniaDoses } from "../schema";
import type { FeatureSeed } from "./demo-features";

const HOUR = 3600 * 1000;
const DAY = 24 * HOUR;

/**
 * Invented ammonia doses for the fishless cycle on the garden-room paludarium, which entered cycling
 * 12 days before the seed ran (see demo-projects.ts); the base seed already holds its water tests.
 */
export const seedDemoWater: FeatureSeed = async (tx, { now, projectIds: p, peopleIds: u }) => {
  const cycleStart = now.getTime() - 12 * DAY;
  await tx.insert(ammoniaDoses).values([
    { projectId: p["brandt-garden-room"], dosedAt: new Date(cycleStart + 8 * HOUR), targetMgL: 2, amountMl: 6, sourcePercent: 10, notes: "First dose after seeding the filter media", byUserId: u.crew2 },
    { projectId: p["brandt-garden-room"], dosedAt: new Date(cycleStart + 2 * DAY + 8 * HOUR), targetMgL: 2, amountMl: 4.5, sourcePercent: 10, notes: "Topped back up to 2 mg/L", byUserId: u.crew2 },
    { projectId: p["brandt-garden-room"], dosedAt: new Date(cycleStart + 4 * DAY + 8 * HOUR), targetMgL: 1, amountMl: 60, sourcePercent: 10, notes: "Logged on the wrong tank", byUserId: u.crew2, voidedAt: new Date(cycleStart + 4 * DAY + 10 * HOUR), voidedBy: u.lead, voidReason: "Entered against the wrong project" },
  ]);
};
