/**
 * How a client reads their fish: plain words, no trade shorthand. Pure, so the wording is tested.
 */
import type { GroupCount } from "./census";
import type { SwimLevel, Temperament } from "./species";

const LEVEL_WORDS: Record<SwimLevel, string> = {
  top: "near the surface",
  middle: "in open water",
  bottom: "near the bottom",
  all: "all over the tank",
};

const TEMPERAMENT_WORDS: Record<Temperament, string> = {
  peaceful: "a calm fish",
  "semi-aggressive": "a fish that can be pushy with others",
  aggressive: "a fish that defends its space hard",
};

export function fishCountWords(n: number): string {
  // "Fish" is its own plural.
  return `${n} fish`;
}

/** One sentence about a group, e.g. "6 Neon tetras in your tank: a calm fish that swims in open water." */
export function groupSentence(g: { commonName: string; temperament: Temperament; level: SwimLevel; census: GroupCount }): string {
  const where = g.census.display > 0 ? `${fishCountWords(g.census.display)} in your tank` : "none in your tank right now";
  const away = g.census.holding > 0 ? ` (${g.census.holding} resting in our holding tank)` : "";
  return `${g.commonName}: ${where}${away}. ${TEMPERAMENT_WORDS[g.temperament][0].toUpperCase()}${TEMPERAMENT_WORDS[g.temperament].slice(1)} that swims ${LEVEL_WORDS[g.level]}.`;
}

/** Growth in words: "about 3.5 cm, up from 2.0 cm on 4 Nov" or nothing when never measured. */
export function growthWords(points: { lengthCm: number; when: string }[], adultLengthMm: number): string | null {
  if (!points.length) return null;
  const last = points[points.length - 1];
  const first = points[0];
  const grown = points.length > 1 ? `, up from ${first.lengthCm.toFixed(1)} cm on ${first.when}` : "";
  return `Last measured at about ${last.lengthCm.toFixed(1)} cm${grown}; fully grown is about ${Math.round(adultLengthMm / 10)} cm.`;
}
