import { z } from "zod";

/**
 * The one vocabulary for text and dates at the boundary. Every schema builds its strings and dates
 * from here, so no field lets through what the database refuses (a NUL byte), what can't be
 * stored as UTF-8 (half of a surrogate pair), or a date nobody meant (year 1, or a boolean read
 * as 1970).
 */

// C0 controls other than tab, line feed and carriage return; NUL is among them.
// eslint-disable-next-line no-control-regex
const CONTROL = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f]/;

/** True for text that can be stored and shown: well-formed UTF-16 without stray control characters. */
export function isCleanText(value: string): boolean {
  return !CONTROL.test(value) && value.isWellFormed();
}

export const UNCLEAN_TEXT = "This has characters that can't be stored (control characters or a broken symbol). Retype it.";

/**
 * A trimmed string of at most `max` characters. `missing` is the message when the value isn't a
 * string at all; add `.min(1, …)` for a required field.
 */
export function text(max: number, tooLong = `Keep this under ${max.toLocaleString("en")} characters.`, missing?: string) {
  return z
    .string(missing ? { error: missing } : undefined)
    .refine(isCleanText, UNCLEAN_TEXT)
    .trim()
    .max(max, tooLong);
}

/** An optional text: absent, null or empty (after trimming) all come out as null. */
export function optionalText(max: number, tooLong?: string) {
  return text(max, tooLong)
    .nullish()
    .transform((v) => (v ? v : null));
}

/** A value kept exactly as typed (a password, a token): not trimmed, but still clean and bounded. */
export function exactText(max: number, tooLong = "That is too long.", missing?: string) {
  return z
    .string(missing ? { error: missing } : undefined)
    .max(max, tooLong)
    .refine(isCleanText, UNCLEAN_TEXT);
}

/**
 * The dates a person could mean here. Work on an aquarium is recorded from 2000 on (nothing in the
 * trade's records predates the app by decades) and planned at most ten years ahead; a route may
 * narrow this further (a water test can't be in the future).
 */
export const DATE_WINDOW = { earliest: Date.UTC(2000, 0, 1), futureYears: 10 } as const;

function latestAllowed(now = Date.now()): number {
  return now + DATE_WINDOW.futureYears * 365.25 * 24 * 3600_000;
}

export function isPlausibleDate(d: Date, now = Date.now()): boolean {
  const t = d.getTime();
  return Number.isFinite(t) && t >= DATE_WINDOW.earliest && t <= latestAllowed(now);
}

const DATE_TIME_SHAPE = /^\d{4}-\d{2}-\d{2}([T ]\d{2}:\d{2}(:\d{2}(\.\d{1,9})?)?(Z|[+-]\d{2}:?\d{2})?)?$/;
export const DATE_ONLY_SHAPE = /^\d{4}-\d{2}-\d{2}$/;

const OUT_OF_WINDOW = `Enter a date between 2000 and ${new Date(latestAllowed()).getUTCFullYear()}.`;

/**
 * A date and time from a datetime-local input, an ISO string or a Date. Numbers and booleans are
 * refused (a `true` would otherwise become 1 January 1970), and so is anything outside DATE_WINDOW.
 */
export function dateTime(message: string) {
  return z.preprocess(
    (v) => {
      if (v instanceof Date) return v;
      if (typeof v !== "string") return v === null || v === undefined ? undefined : v;
      const s = v.trim();
      if (s === "") return undefined;
      if (!DATE_TIME_SHAPE.test(s)) return new Date(Number.NaN);
      return new Date(s);
    },
    z
      .date({ error: message })
      .refine((d) => !Number.isNaN(d.getTime()), message)
      .refine((d) => Number.isNaN(d.getTime()) || isPlausibleDate(d), OUT_OF_WINDOW),
  );
}

/** A calendar date `YYYY-MM-DD` (kept as the string), or "" for none, inside DATE_WINDOW. */
export function dateOnlyOrEmpty(message = "Enter a date, or leave it empty.") {
  return z.string({ error: message }).refine((v) => {
    if (v === "") return true;
    if (!DATE_ONLY_SHAPE.test(v)) return false;
    const d = new Date(`${v}T00:00:00Z`);
    return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === v && isPlausibleDate(d);
  }, message);
}

/** An ISO instant sent back as it was received (a version stamp), inside DATE_WINDOW. */
export function isoInstant(message: string) {
  return z.iso.datetime({ offset: true, error: message }).refine((v) => isPlausibleDate(new Date(v)), message);
}

/** Why something is voided, corrected or overridden: a few words, kept with the record. */
export const reasonSchema = text(500, "Keep the reason under 500 characters.", "Say why, in a few words.").min(3, "Say why, in a few words.");

/** Free notes on a record; empty is null. */
export const optionalNotes = optionalText(1000, "Keep notes under 1,000 characters.");
