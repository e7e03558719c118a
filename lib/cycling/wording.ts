/**
 * Plain-English fragments shared by cycle reasons, warnings and client text,
 * kept in one place so the same duration never reads two different ways.
 */

const SMALL_NUMBERS = ["zero", "one", "two", "three", "four", "five", "six", "seven", "eight", "nine", "ten"];

/** Small counts as words ("two"), which read better in sentences; larger ones stay as digits. */
export function countWord(n: number): string {
  return Number.isInteger(n) && n >= 0 && n < SMALL_NUMBERS.length ? SMALL_NUMBERS[n] : String(n);
}

/** Capitalises the first letter, for a word that opens a sentence. */
export function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/** A measured duration as a rough phrase: "40 minutes", "6 hours", "3 days". */
export function formatDuration(hours: number): string {
  const minutes = Math.round(hours * 60);
  if (minutes < 60) return minutes <= 1 ? "1 minute" : `${minutes} minutes`;
  // Up to two days, hours are more useful than "1 day" for judging a 24 h rule.
  if (hours < 48) {
    const h = Math.round(hours);
    return h === 1 ? "an hour" : `${h} hours`;
  }
  return `${Math.floor(hours / 24)} days`;
}

/** How long ago something happened; anything not yet a minute old (or stamped slightly ahead) is "just now". */
export function formatAgo(hours: number): string {
  return hours < 1 / 60 ? "just now" : `${formatDuration(hours)} ago`;
}

/** A rule's spacing as written in a sentence: 24 → "a day", 48 → "2 days", 12 → "12 hours". */
export function formatRuleSpan(hours: number): string {
  if (hours > 0 && hours % 24 === 0) return hours === 24 ? "a day" : `${hours / 24} days`;
  return hours === 1 ? "an hour" : `${hours} hours`;
}

/** A rule's limit in hours, kept literal ("24 hours") because staff check it against the clock. */
export function formatRuleHours(hours: number): string {
  return hours === 1 ? "1 hour" : `${hours} hours`;
}

/** A concentration without float noise or trailing zeros: 0.25 → "0.25 mg/L", 1 → "1 mg/L". */
export function formatMgL(value: number): string {
  return `${Number(value.toFixed(3))} mg/L`;
}
