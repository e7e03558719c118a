/**
 * The checks beside a stocking plan. Each is a rule of thumb the trade uses (common practice), not
 * a law of biology: individual fish differ and the lead's judgement decides. Every check is pure
 * and looks at each species (or pair of species) on its own, so adding a species to a plan can add
 * warnings but never takes one away.
 */
import { formatRange, inRange, overlap } from "./ranges";
import { WATER_LABELS, type Species, type WaterKind } from "./species";

export type PlanLine = { batch: number; species: Species; count: number };

/** What the checks know about the tank; null where the design or the readings don't say. */
export type TankFacts = {
  water: WaterKind | null;
  /** Inside length along the front (a cylinder's diameter), mm. */
  lengthMm: number | null;
  netVolumeL: number | null;
  tempC: number | null;
  pH: number | null;
  reef: boolean;
};

export type CheckRule = "water" | "temperature" | "ph" | "length" | "temperament" | "predation" | "shoaling" | "reef" | "bioload" | "order";

export type StockingWarning = {
  rule: CheckRule;
  /** Stable identity of the finding (rule and species involved), independent of its wording. */
  key: string;
  severity: "warning" | "note";
  message: string;
  speciesIds: string[];
};

export const RULE_OF_THUMB_CAUTION =
  "These checks are rules of thumb (common practice), not guarantees: individual fish differ, and the lead's judgement decides.";

type Grouped = { species: Species; count: number; firstBatch: number; lastBatch: number };

/** One entry per species with its total count and the first and last batch it appears in. */
export function groupBySpecies(lines: PlanLine[]): Grouped[] {
  const by = new Map<string, Grouped>();
  for (const l of lines) {
    const g = by.get(l.species.id);
    if (g) {
      g.count += l.count;
      g.firstBatch = Math.min(g.firstBatch, l.batch);
      g.lastBatch = Math.max(g.lastBatch, l.batch);
    } else by.set(l.species.id, { species: l.species, count: l.count, firstBatch: l.batch, lastBatch: l.batch });
  }
  return [...by.values()];
}

function pairs<T>(items: T[]): [T, T][] {
  const out: [T, T][] = [];
  // Stryker disable next-line EqualityOperator: at i = length the inner loop starts past the end and adds nothing
  for (let i = 0; i < items.length; i++) for (let j = i + 1; j < items.length; j++) out.push([items[i], items[j]]);
  return out;
}

const pairKey = (rule: CheckRule, a: Species, b: Species) => `${rule}:${[a.id, b.id].sort().join("+")}`;
const cm = (mm: number) => `${Math.round(mm / 10)} cm`;

/** Each species' water kind against the tank's (common practice: fish stay in the water kind they live in). */
export function checkWaterKind(lines: PlanLine[], tank: TankFacts): StockingWarning[] {
  if (!tank.water) return [];
  return groupBySpecies(lines)
    .filter((g) => g.species.water !== tank.water)
    .map(({ species: s }) => ({
      rule: "water",
      key: `water:${s.id}`,
      severity: "warning",
      message: `${s.commonName} lives in ${WATER_LABELS[s.water]}; this tank holds ${WATER_LABELS[tank.water!]}.`,
      speciesIds: [s.id],
    }));
}

function rangeCheck(rule: "temperature" | "ph", lines: PlanLine[], setValue: number | null): StockingWarning[] {
  const label = rule === "temperature" ? "Temperature" : "pH";
  const unit = rule === "temperature" ? "°C" : "";
  const digits = rule === "temperature" ? 0 : 1;
  const pick = (s: Species) => (rule === "temperature" ? s.tempC : s.pH);
  const groups = groupBySpecies(lines);
  const out: StockingWarning[] = [];
  for (const [a, b] of pairs(groups)) {
    if (overlap(pick(a.species), pick(b.species))) continue;
    out.push({
      rule,
      key: pairKey(rule, a.species, b.species),
      severity: "warning",
      message: `${label}: ${a.species.commonName} (${formatRange(pick(a.species), unit, digits)}) and ${b.species.commonName} (${formatRange(pick(b.species), unit, digits)}) have no range in common.`,
      speciesIds: [a.species.id, b.species.id],
    });
  }
  if (setValue != null) {
    for (const { species: s } of groups) {
      if (inRange(setValue, pick(s))) continue;
      const shown = rule === "temperature" ? `${setValue.toFixed(0)} °C` : `pH ${setValue.toFixed(1)}`;
      out.push({
        rule,
        key: `${rule}:tank+${s.id}`,
        severity: "warning",
        message: `${label}: the tank runs at ${shown}; ${s.commonName} wants ${formatRange(pick(s), unit, digits)}.`,
        speciesIds: [s.id],
      });
    }
  }
  return out;
}

/** Every pair of species shares some temperature, and the tank's set temperature suits each. */
export const checkTemperature = (lines: PlanLine[], tank: TankFacts) => rangeCheck("temperature", lines, tank.tempC);
/** Every pair of species shares some pH, and the tank's pH suits each. */
export const checkPh = (lines: PlanLine[], tank: TankFacts) => rangeCheck("ph", lines, tank.pH);

/** Common practice: a tank at least six times as long as the fish grows, or the species' own minimum if longer. */
export const LENGTH_MULTIPLE = 6;

export function requiredTankLengthMm(s: Species): number {
  return Math.max(LENGTH_MULTIPLE * s.adultLengthMm, s.minTankLengthMm ?? 0);
}

export function checkLength(lines: PlanLine[], tank: TankFacts): StockingWarning[] {
  if (tank.lengthMm == null) return [];
  return groupBySpecies(lines)
    .filter((g) => requiredTankLengthMm(g.species) > tank.lengthMm!)
    .map(({ species: s }) => ({
      rule: "length",
      key: `length:${s.id}`,
      severity: "warning",
      message: `${s.commonName} grows to about ${cm(s.adultLengthMm)} and wants a tank at least ${cm(requiredTankLengthMm(s))} long; this one is ${cm(tank.lengthMm!)}.`,
      speciesIds: [s.id],
    }));
}

/** Common practice: an aggressive species and a peaceful one end badly for the peaceful one. */
export function checkTemperament(lines: PlanLine[]): StockingWarning[] {
  const out: StockingWarning[] = [];
  for (const [a, b] of pairs(groupBySpecies(lines))) {
    const pair = a.species.temperament === "aggressive" && b.species.temperament === "peaceful" ? [a, b] : b.species.temperament === "aggressive" && a.species.temperament === "peaceful" ? [b, a] : null;
    if (!pair) continue;
    const [bully, meek] = pair;
    out.push({
      rule: "temperament",
      key: pairKey("temperament", a.species, b.species),
      severity: "warning",
      message: `${bully.species.commonName} is aggressive and ${meek.species.commonName} is peaceful: expect harassment.`,
      speciesIds: [bully.species.id, meek.species.id],
    });
  }
  return out;
}

/** Common practice: a fish that eats other animals will try anything a third of its length or less. */
export const PREY_FRACTION = 1 / 3;

export function canEat(predator: Species, prey: Species): boolean {
  if (predator.id === prey.id) return false;
  if (predator.diet !== "carnivore" && predator.diet !== "omnivore") return false;
  return prey.adultLengthMm <= predator.adultLengthMm * PREY_FRACTION;
}

export function checkPredation(lines: PlanLine[]): StockingWarning[] {
  const out: StockingWarning[] = [];
  const groups = groupBySpecies(lines);
  for (const p of groups) {
    for (const q of groups) {
      if (!canEat(p.species, q.species)) continue;
      out.push({
        rule: "predation",
        key: `predation:${p.species.id}>${q.species.id}`,
        severity: "warning",
        message: `${p.species.commonName} grows to about ${cm(p.species.adultLengthMm)} and can swallow ${q.species.commonName} (about ${cm(q.species.adultLengthMm)}).`,
        speciesIds: [p.species.id, q.species.id],
      });
    }
  }
  return out;
}

/** A shoaling species planned below its comfortable group size (counting every batch). */
export function checkShoaling(lines: PlanLine[]): StockingWarning[] {
  return groupBySpecies(lines)
    .filter((g) => g.count < g.species.shoalMin)
    .map(({ species: s, count }) => ({
      rule: "shoaling",
      key: `shoaling:${s.id}`,
      severity: "warning",
      message: `${s.commonName} is kept in groups of ${s.shoalMin} or more; the plan has ${count}.`,
      speciesIds: [s.id],
    }));
}

/** In a reef, species known to nip corals or eat invertebrates. */
export function checkReef(lines: PlanLine[], tank: TankFacts): StockingWarning[] {
  if (!tank.reef) return [];
  const out: StockingWarning[] = [];
  for (const { species: s } of groupBySpecies(lines)) {
    const harms = [s.coralSafe === false ? "corals" : "", s.invertSafe === false ? "invertebrates" : ""].filter(Boolean);
    if (!harms.length) continue;
    out.push({ rule: "reef", key: `reef:${s.id}`, severity: "warning", message: `${s.commonName} isn't safe with ${harms.join(" or ")} in a reef.`, speciesIds: [s.id] });
  }
  return out;
}

/** Common practice: peaceful fish go in first and territorial ones last, so no one claims the tank before the rest arrive. */
export function checkOrder(lines: PlanLine[]): StockingWarning[] {
  const groups = groupBySpecies(lines);
  const out: StockingWarning[] = [];
  for (const t of groups.filter((g) => g.species.territorial)) {
    for (const p of groups.filter((g) => g.species.temperament === "peaceful" && !g.species.territorial)) {
      if (t.firstBatch >= p.lastBatch) continue;
      out.push({
        rule: "order",
        key: `order:${t.species.id}<${p.species.id}`,
        severity: "note",
        message: `Territorial ${t.species.commonName} (batch ${t.firstBatch}) is planned before peaceful ${p.species.commonName} (batch ${p.lastBatch}); territorial fish usually go in last.`,
        speciesIds: [t.species.id, p.species.id],
      });
    }
  }
  return out;
}
