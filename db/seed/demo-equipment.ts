import { equipment, equipmentServices, visits } from "../schema";
import type { FeatureSeed } from "./demo-features";

const HOUR = 3600 * 1000;
const DAY = 24 * HOUR;

/**
 * Invented equipment on the tanks in service (every make and model is made up), with one filter
 * overdue for its service and one warranty about to end, and service visits assigned to the crew
 * so the due list has something to show before any service plan exists.
 */
export const seedDemoEquipment: FeatureSeed = async (tx, { now, projectIds: p, peopleIds: u }) => {
  const at = (daysAgo: number, hour = 10) => new Date(Math.floor(now.getTime() / DAY) * DAY - daysAgo * DAY + hour * HOUR);
  const day = (daysAgo: number) => at(daysAgo, 0).toISOString().slice(0, 10);
  const dining = p["marchetti-dining"];
  const surgery = p["ashdown-surgery"];
  const pieces = await tx
    .insert(equipment)
    .values([
      { projectId: dining, kind: "canister filter", makeModel: "Canister 1200 (house brand)", installedOn: day(110), warrantyUntil: day(-620), lastServicedAt: at(30), createdBy: u.lead, notes: "Hose clamps were stiff last time: bring spares." },
      { projectId: dining, kind: "heater", makeModel: "Glass heater 300 W (house brand)", installedOn: day(110), warrantyUntil: day(-3), lastServicedAt: at(20), createdBy: u.lead },
      { projectId: dining, kind: "lighting", makeModel: "LED bar 120 cm (house brand)", installedOn: day(110), warrantyUntil: day(-620), createdBy: u.lead },
      { projectId: surgery, kind: "sump return pump", makeModel: "Return pump DC 40 (house brand)", installedOn: day(200), warrantyUntil: day(-165), lastServicedAt: at(60), createdBy: u.lead },
      { projectId: surgery, kind: "UV clarifier", makeModel: "UV unit 18 W (house brand)", installedOn: day(200), warrantyUntil: day(-30), lastServicedAt: at(170), createdBy: u.lead, serviceIntervalDays: 180 },
      // Last cleaned 140 days ago on the 120-day interval (common practice): 20 days overdue.
      { projectId: surgery, kind: "canister filter", makeModel: "Canister 900 (house brand)", installedOn: day(200), lastServicedAt: at(140), createdBy: u.lead },
    ])
    .returning({ id: equipment.id, lastServicedAt: equipment.lastServicedAt });
  const serviced = pieces.filter((x) => x.lastServicedAt);
  await tx.insert(equipmentServices).values(serviced.map((x) => ({ equipmentId: x.id, servicedAt: x.lastServicedAt!, note: "Routine service", byUserId: u.crew1 })));
  await tx.insert(visits).values([
    { projectId: surgery, kind: "service visit", startsAt: at(3, 9), durationMinutes: 90, assignedTo: u.crew2, createdBy: u.lead, notes: "Water change and glass clean." },
    { projectId: dining, kind: "service visit", startsAt: at(-1, 10), durationMinutes: 90, assignedTo: u.crew1, createdBy: u.lead, notes: "Water change; clean the canister filter." },
    { projectId: surgery, kind: "service visit", startsAt: at(-2, 14), durationMinutes: 90, assignedTo: u.crew2, createdBy: u.lead },
    { projectId: dining, kind: "service visit", startsAt: at(-8, 10), durationMinutes: 90, assignedTo: u.crew1, createdBy: u.lead },
  ]);
};
