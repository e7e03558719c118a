import "server-only";
import { and, eq, isNotNull, isNull, sql } from "drizzle-orm";
import { db } from "../index";
import { livestockEvents, livestockGroups, planBatches, projects, species } from "../schema";

/**
 * What is in each holding tank now: batches in quarantine, and fish moved out of a display and not
 * yet back (moves in, less moves back, losses and rehomings from holding).
 */
export async function getHoldingTankOccupants() {
  const [batches, moved] = await Promise.all([
    db()
      .select({ id: planBatches.id, holdingTankId: planBatches.holdingTankId, position: planBatches.position, title: projects.title })
      .from(planBatches)
      .innerJoin(projects, eq(projects.id, planBatches.projectId))
      .where(and(isNotNull(planBatches.quarantineStartedAt), isNull(planBatches.stockingBatchId))),
    db()
      .select({
        groupId: livestockGroups.id,
        holdingTankId: sql<string>`(array_agg(${livestockEvents.holdingTankId} order by ${livestockEvents.at} desc) filter (where ${livestockEvents.kind} = 'to_holding'))[1]`,
        count: sql<number>`coalesce(sum(case when ${livestockEvents.kind} = 'to_holding' then ${livestockEvents.count}
          when ${livestockEvents.kind} = 'from_holding' then -${livestockEvents.count}
          when ${livestockEvents.kind} in ('lost', 'rehomed') and ${livestockEvents.place} = 'holding' then -${livestockEvents.count} else 0 end), 0)::int`,
        name: species.commonName,
        title: projects.title,
      })
      .from(livestockEvents)
      .innerJoin(livestockGroups, eq(livestockGroups.id, livestockEvents.groupId))
      .innerJoin(species, eq(species.id, livestockGroups.speciesId))
      .innerJoin(projects, eq(projects.id, livestockGroups.projectId))
      .groupBy(livestockGroups.id, species.commonName, projects.title),
  ]);
  return [
    ...batches.map((b) => ({ key: `b-${b.id}`, holdingTankId: b.holdingTankId, text: `Quarantine: batch ${b.position} for ${b.title}` })),
    ...moved.filter((m) => m.count > 0).map((m) => ({ key: `g-${m.groupId}`, holdingTankId: m.holdingTankId, text: `${m.count} × ${m.name} from ${m.title}` })),
  ];
}
