import type { Species } from "@/lib/stocking/species";
import type { PlanLine, TankFacts } from "@/lib/stocking/checks";

let n = 0;
/** An invented species with tropical community values; each test states only what it changes. */
export function sp(over: Partial<Species> & { commonName: string }): Species {
  n += 1;
  return {
    id: `sp-${over.commonName.toLowerCase().replace(/\W+/g, "-")}-${n}`,
    scientificName: "Testus exemplaris",
    water: "fresh",
    tempC: { min: 22, max: 28 },
    pH: { min: 6.5, max: 7.5 },
    adultLengthMm: 50,
    temperament: "peaceful",
    territorial: false,
    shoalMin: 1,
    level: "middle",
    coralSafe: null,
    invertSafe: null,
    diet: "omnivore",
    minTankLengthMm: null,
    ...over,
  };
}

export const line = (species: Species, count = 1, batch = 1): PlanLine => ({ species, count, batch });

export const tank = (over: Partial<TankFacts> = {}): TankFacts => ({ water: "fresh", lengthMm: 1200, netVolumeL: 300, tempC: 25, pH: 7.0, reef: false, ...over });
