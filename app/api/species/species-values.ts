import type { SpeciesValues } from "./species.schema";

/** Coral and invertebrate safety only mean something in salt water. */
export function speciesValues(v: SpeciesValues) {
  return { ...v, coralSafe: v.water === "salt" ? v.coralSafe : null, invertSafe: v.water === "salt" ? v.invertSafe : null };
}
