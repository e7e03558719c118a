import { and, eq, inArray } from "drizzle-orm";
import { holdingTanks, livestockEvents, livestockGroups, planBatches, planBatchItems, species, stockingBatches, stockingPlans } from "../schema";
import { seedSpeciesCatalogue } from "./species/seed";
import type { FeatureSeed } from "./demo-features";

const DAY = 24 * 3600 * 1000;

/**
 * The species catalogue, two invented holding tanks, a reef plan whose first batch is in quarantine,
 * and the livestock record of a community tank in service (its existing first batch becomes plan batch 1).
 */
export const seedDemoLivestock: FeatureSeed = async (tx, { now, projectIds: p, peopleIds: u }) => {
  await seedSpeciesCatalogue(tx);
  const [rackA, rackB] = await tx
    .insert(holdingTanks)
    .values([
      { name: "Rack A, tank 1", volumeL: 120, location: "Workshop, back wall" },
      { name: "Rack A, tank 2", volumeL: 200, location: "Workshop, back wall" },
    ])
    .returning();
  const names = ["Ocellaris clownfish", "Yellow watchman goby", "Blue-green chromis", "Coral beauty", "Neon tetra", "Harlequin rasbora", "Bronze corydoras", "Pearl gourami"];
  const rows = await tx.select({ id: species.id, name: species.commonName }).from(species).where(inArray(species.commonName, names));
  const sp = (n: string) => rows.find((r) => r.name === n)!.id;
  const t = (daysAgo: number) => new Date(now.getTime() - daysAgo * DAY);

  // The reef in first stocking: batch 1 in quarantine for 10 days, batch 2 planned.
  const reef = p["aldous-office"];
  await tx.insert(stockingPlans).values({ projectId: reef, reef: true, updatedBy: u.lead });
  const [r1, r2] = await tx
    .insert(planBatches)
    .values([
      { projectId: reef, position: 1, holdingTankId: rackA.id, quarantineStartedAt: t(10), quarantineDays: 28, createdBy: u.lead, note: "Hardy fish first, while the rock matures." },
      { projectId: reef, position: 2, createdBy: u.lead },
    ])
    .returning();
  await tx.insert(planBatchItems).values([
    { batchId: r1.id, speciesId: sp("Ocellaris clownfish"), count: 2 },
    { batchId: r1.id, speciesId: sp("Yellow watchman goby"), count: 1 },
    { batchId: r2.id, speciesId: sp("Blue-green chromis"), count: 6 },
    { batchId: r2.id, speciesId: sp("Coral beauty"), count: 1 },
  ]);

  // The community tank in service: its recorded first batch, then a second, with a history.
  const community = p["marchetti-dining"];
  const [first] = await tx.select().from(stockingBatches).where(and(eq(stockingBatches.projectId, community)));
  await tx.insert(stockingPlans).values({ projectId: community, updatedBy: u.lead });
  const [c1] = await tx
    .insert(planBatches)
    .values({ projectId: community, position: 1, holdingTankId: rackB.id, quarantineStartedAt: new Date(first.addedAt.getTime() - 28 * DAY), quarantineDays: 28, stockingBatchId: first.id, createdBy: u.lead })
    .returning();
  await tx.insert(planBatchItems).values([
    { batchId: c1.id, speciesId: sp("Harlequin rasbora"), count: 8 },
    { batchId: c1.id, speciesId: sp("Bronze corydoras"), count: 6 },
  ]);
  const source = "Plan batch 1, after 28 days in quarantine";
  const [ras, cory] = await tx
    .insert(livestockGroups)
    .values([
      { projectId: community, speciesId: sp("Harlequin rasbora"), source, addedAt: first.addedAt, planBatchId: c1.id },
      { projectId: community, speciesId: sp("Bronze corydoras"), source, addedAt: first.addedAt, planBatchId: c1.id },
    ])
    .returning();
  const at = (d: number) => new Date(first.addedAt.getTime() + d * DAY);
  await tx.insert(livestockEvents).values([
    { projectId: community, groupId: ras.id, kind: "added", at: at(0), count: 8, place: "display", byUserId: u.crew1 },
    { projectId: community, groupId: cory.id, kind: "added", at: at(0), count: 6, place: "display", byUserId: u.crew1 },
    { projectId: community, groupId: ras.id, kind: "measured", at: at(1), lengthMm: 22, note: "Average of three caught for the check", byUserId: u.crew1 },
    { projectId: community, groupId: ras.id, kind: "measured", at: at(30), lengthMm: 29, byUserId: u.crew1 },
    { projectId: community, groupId: ras.id, kind: "lost", at: at(33), count: 1, place: "display", cause: "Found behind the rockwork; no sign of disease in the others", byUserId: u.crew1 },
    { projectId: community, groupId: cory.id, kind: "behaviour", at: at(40), note: "One corydoras with a split tail fin; no fish seen chasing it", byUserId: u.crew1 },
    { projectId: community, groupId: cory.id, kind: "to_holding", at: at(41), count: 1, holdingTankId: rackB.id, note: "Moved to heal", byUserId: u.crew1 },
    { projectId: community, groupId: cory.id, kind: "from_holding", at: at(52), count: 1, holdingTankId: rackB.id, note: "Fin grown back", byUserId: u.crew1 },
    { projectId: community, groupId: ras.id, kind: "measured", at: at(55), lengthMm: 34, byUserId: u.crew1 },
  ]);
};
