import { parseMajor } from "./amounts";

/** What a person types in a money form, to and from the integers the API takes. */

/** "12.5" (%) → 1250 basis points; null when it isn't a plain number with up to two decimals. */
export function percentToBp(text: string): number | null {
  return parseMajor(text, 2);
}

export function bpToPercent(bp: number): string {
  return String(bp / 100);
}

/** "2.345" → 2345 thousandths; null when it isn't a plain number with up to three decimals. */
export function quantityToMilli(text: string): number | null {
  return parseMajor(text, 3);
}

export function minorToMajor(minor: number, decimals = 2): string {
  return (minor / 10 ** decimals).toFixed(decimals);
}
