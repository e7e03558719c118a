import type { LivestockView } from "@/db/queries/livestock";

/** The livestock record with dates as strings, for client components. */
export function toLivestockProps(v: LivestockView) {
  return {
    groups: v.groups.map((g) => ({
      id: g.id,
      commonName: g.commonName,
      scientificName: g.scientificName,
      temperament: g.temperament,
      level: g.level,
      adultLengthMm: g.adultLengthMm,
      source: g.source,
      addedAt: g.addedAt.toISOString(),
      census: g.census,
      growth: g.growth.map((m) => ({ t: m.at.getTime(), lengthCm: Math.round(m.lengthMm) / 10 })),
    })),
    history: v.history.map((e) => ({ ...e, at: e.at.toISOString() })),
  };
}

export type LivestockProps = ReturnType<typeof toLivestockProps>;
export type GroupProps = LivestockProps["groups"][number];
