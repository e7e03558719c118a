import { projectTestKits, testKits } from "../schema";
import type { FeatureSeed } from "./demo-features";

/**
 * Two kits the demo company describes in its own words (invented names, round steps of our own), and
 * one project that reads ammonia with the first.
 */
export const seedDemoKits: FeatureSeed = async (tx, { projectIds, peopleIds }) => {
  const lead = peopleIds.lead;
  const [van, lab] = await tx
    .insert(testKits)
    .values([
      { name: "Van case ammonia", analyte: "ammonia", basis: "compound", steps: [0, 0.5, 1, 2, 3, 4, 6], createdBy: lead },
      { name: "Workshop nitrate (as N)", analyte: "nitrate", basis: "nitrogen", steps: [0, 2, 4, 6, 8, 10, 15, 20], createdBy: lead },
    ])
    .returning({ id: testKits.id });
  const living = projectIds["quist-living"];
  if (living) {
    await tx.insert(projectTestKits).values([
      { projectId: living, analyte: "ammonia", kitId: van.id, chosenBy: lead },
      { projectId: living, analyte: "nitrate", kitId: lab.id, chosenBy: lead },
    ]);
  }
};
