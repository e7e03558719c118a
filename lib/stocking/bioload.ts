/**
 * A rough bioload estimate: the adult length of every fish added up, against what the tank's net
 * water volume carries by a per-litre allowance. Common practice, and only a rough guide: it ignores
 * a fish's bulk (a long thin fish counts as much as a deep-bodied one of the same length),
 * filtration and feeding.
 */
import { groupBySpecies, type PlanLine, type StockingWarning, type TankFacts } from "./checks";
import type { WaterKind } from "./species";

/** Litres of net water per centimetre of adult fish (common practice; salt water is stocked far lighter). */
export const LITRES_PER_CM: Record<WaterKind, number> = { fresh: 2, brackish: 2, salt: 8 };
/** Past this share of the allowance the estimate says the tank is getting full. */
export const NEAR_FULL_SHARE = 0.8;

export type BioloadEstimate = {
  fishCm: number;
  allowanceCm: number;
  /** fishCm / allowanceCm. */
  share: number;
  rule: string;
};

export function bioloadRule(water: WaterKind): string {
  return `About 1 cm of adult fish per ${LITRES_PER_CM[water]} L of net water in ${water} water (common practice; a rough guide).`;
}

export function estimateBioload(lines: PlanLine[], tank: TankFacts): BioloadEstimate | null {
  // Stryker disable next-line ConditionalExpression: null <= 0 holds in JS, so the next test turns a missing volume away too
  if (tank.netVolumeL == null || tank.netVolumeL <= 0 || !tank.water) return null;
  const fishCm = groupBySpecies(lines).reduce((sum, g) => sum + (g.count * g.species.adultLengthMm) / 10, 0);
  const allowanceCm = tank.netVolumeL / LITRES_PER_CM[tank.water];
  return { fishCm, allowanceCm, share: fishCm / allowanceCm, rule: bioloadRule(tank.water) };
}

export function checkBioload(lines: PlanLine[], tank: TankFacts): StockingWarning[] {
  const e = estimateBioload(lines, tank);
  if (!e || e.share <= NEAR_FULL_SHARE) return [];
  const pct = Math.round(e.share * 100);
  const over = e.share > 1;
  return [
    {
      rule: "bioload",
      key: "bioload",
      severity: over ? "warning" : "note",
      message: `${over ? "Over" : "Close to"} the rough stocking allowance: ${Math.round(e.fishCm)} cm of adult fish against about ${Math.round(e.allowanceCm)} cm (${pct}%). ${e.rule}`,
      speciesIds: groupBySpecies(lines).map((g) => g.species.id),
    },
  ];
}
