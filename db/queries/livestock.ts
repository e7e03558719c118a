import "server-only";
import { and, asc, eq, isNull } from "drizzle-orm";
import { db } from "../index";
import { holdingTanks, livestockEvents, livestockGroups, species, users } from "../schema";
import { badRequest } from "../../server/errors";
import { applyEvent, censusOf, growthSeries, type EventKind, type Place } from "../../lib/stocking/census";

/** Every group in a tank with its species, census, growth and history (oldest event first). */
export async function getLivestock(projectId: string) {
  const [groups, events] = await Promise.all([
    db()
      .select({ group: livestockGroups, species })
      .from(livestockGroups)
      .innerJoin(species, eq(species.id, livestockGroups.speciesId))
      .where(eq(livestockGroups.projectId, projectId))
      .orderBy(asc(livestockGroups.addedAt), asc(species.commonName)),
    db()
      .select({ event: livestockEvents, byName: users.name, holdingName: holdingTanks.name })
      .from(livestockEvents)
      .innerJoin(users, eq(users.id, livestockEvents.byUserId))
      .leftJoin(holdingTanks, eq(holdingTanks.id, livestockEvents.holdingTankId))
      .where(eq(livestockEvents.projectId, projectId))
      .orderBy(asc(livestockEvents.at), asc(livestockEvents.createdAt)),
  ]);
  const view = groups.map(({ group, species: s }) => {
    const own = events.filter((e) => e.event.groupId === group.id).map((e) => e.event);
    return {
      id: group.id,
      speciesId: s.id,
      commonName: s.commonName,
      scientificName: s.scientificName,
      temperament: s.temperament,
      level: s.level,
      adultLengthMm: s.adultLengthMm,
      source: group.source,
      addedAt: group.addedAt,
      census: censusOf(own),
      growth: growthSeries(own),
    };
  });
  const history = events.map(({ event: e, byName, holdingName }) => ({
    id: e.id,
    groupId: e.groupId,
    kind: e.kind,
    at: e.at,
    count: e.count,
    place: e.place,
    cause: e.cause,
    lengthMm: e.lengthMm,
    note: e.note,
    holdingTankName: holdingName,
    byName,
  }));
  return { groups: view, history: history.reverse() };
}

export type LivestockView = Awaited<ReturnType<typeof getLivestock>>;

export type EventInput = {
  groupId: string;
  kind: Exclude<EventKind, "added">;
  at: Date;
  count: number | null;
  place: Place | null;
  cause: string | null;
  holdingTankId: string | null;
  lengthMm: number | null;
  note: string | null;
};

/**
 * Records one event on a group. The group's row is locked and its census rebuilt, so two people
 * moving the same fish at once can't take more than are there; a refused event saves nothing.
 */
export async function addLivestockEvent(opts: { projectId: string; userId: string; values: EventInput }) {
  const v = opts.values;
  return db().transaction(async (tx) => {
    const [group] = await tx
      .select({ id: livestockGroups.id, addedAt: livestockGroups.addedAt })
      .from(livestockGroups)
      .where(and(eq(livestockGroups.id, v.groupId), eq(livestockGroups.projectId, opts.projectId)))
      .for("update");
    if (!group) throw badRequest("Some fields need attention.", { groupId: "Choose one of this tank's groups of fish." });
    if (v.at < group.addedAt) throw badRequest("Some fields need attention.", { at: "That is before these fish were added." });
    if (v.kind === "to_holding") {
      const [tank] = v.holdingTankId
        ? await tx.select({ id: holdingTanks.id }).from(holdingTanks).where(and(eq(holdingTanks.id, v.holdingTankId), isNull(holdingTanks.retiredAt)))
        : [];
      if (!tank) throw badRequest("Some fields need attention.", { holdingTankId: "Choose the holding tank the fish go to." });
    }
    const past = await tx
      .select({ kind: livestockEvents.kind, count: livestockEvents.count, place: livestockEvents.place, at: livestockEvents.at })
      .from(livestockEvents)
      .where(eq(livestockEvents.groupId, group.id))
      .orderBy(asc(livestockEvents.at), asc(livestockEvents.createdAt));
    // A back-dated event must fit the history at its own date and leave every later event possible.
    const next = { kind: v.kind, count: v.count, place: v.place, at: v.at };
    const before = past.filter((e) => e.at <= v.at);
    const step = applyEvent(censusOf(before), next);
    if (!step.ok) throw badRequest("Some fields need attention.", { count: step.message });
    let state = step.state;
    for (const later of past.filter((e) => e.at > v.at)) {
      const r = applyEvent(state, later);
      if (!r.ok) throw badRequest("Some fields need attention.", { at: "Later events in this group's history need those fish; record it on a later date." });
      state = r.state;
    }
    const result = { state };
    const [row] = await tx
      .insert(livestockEvents)
      .values({
        projectId: opts.projectId,
        groupId: group.id,
        kind: v.kind,
        at: v.at,
        count: v.count,
        place: v.kind === "lost" || v.kind === "rehomed" ? (v.place ?? "display") : null,
        cause: v.cause,
        holdingTankId: v.kind === "to_holding" || v.kind === "from_holding" ? v.holdingTankId : null,
        lengthMm: v.lengthMm,
        note: v.note,
        byUserId: opts.userId,
      })
      .returning();
    return { event: row, census: result.state };
  });
}
