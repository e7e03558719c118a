import { messages, notes, visits } from "../schema";
import type { FeatureSeed } from "./demo-features";

const HOUR = 3600 * 1000;
const DAY = 24 * HOUR;

/** Invented notes, messages and visits so the portal and the Messages & notes page have something to show. */
export const seedDemoPortal: FeatureSeed = async (tx, { now, projectIds: p, peopleIds: u }) => {
  const at = (daysAgo: number, hour = 10) => new Date(Math.floor(now.getTime() / DAY) * DAY - daysAgo * DAY + hour * HOUR);
  await tx.insert(notes).values([
    { projectId: p["brandt-garden-room"], authorId: u.lead, shared: true, body: "The filter media is seeded and the first ammonia dose went in. Expect daily tests for the next few weeks.", createdAt: at(11) },
    { projectId: p["brandt-garden-room"], authorId: u.lead, shared: false, body: "Client asked about adding frogs later: check the lid gap before agreeing.", createdAt: at(9) },
    { projectId: p["quist-living"], authorId: u.lead, shared: true, body: "Nitrite is up, which is the second half of the cycle starting. All on track.", createdAt: at(6) },
    { projectId: p["brandt-lounge"], authorId: u.lead, shared: false, body: "Floor joists run front to back; bring the moisture meter on the survey.", createdAt: at(2) },
  ]);
  await tx.insert(messages).values([
    { projectId: p["brandt-garden-room"], authorId: u.hollis, body: "The water looks a bit cloudy this morning. Is that normal?", createdAt: at(4, 8) },
    { projectId: p["brandt-garden-room"], authorId: u.crew2, body: "Yes: a bacterial bloom is common early in the cycle. It clears on its own within a few days; no need to change water.", createdAt: at(4, 11) },
    { projectId: p["quist-living"], authorId: u.amara, body: "Could the next water test be after 4pm on weekdays?", createdAt: at(3, 9) },
  ]);
  await tx.insert(visits).values([
    { projectId: p["brandt-lounge"], kind: "install day", startsAt: at(-40, 9), durationMinutes: 480, notes: "Two crew, stair climber for the tank.", createdBy: u.lead },
    { projectId: p["brandt-garden-room"], kind: "water test", startsAt: at(-2, 16), durationMinutes: 30, createdBy: u.lead },
    { projectId: p["quist-living"], kind: "water test", startsAt: at(-1, 16), durationMinutes: 30, createdBy: u.lead },
    { projectId: p["brandt-bedroom"], kind: "install day", startsAt: at(-3, 9), durationMinutes: 240, createdBy: u.lead },
  ]);
};
