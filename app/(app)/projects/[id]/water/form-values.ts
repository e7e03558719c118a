import { z } from "zod";

// Empty means "not entered" (null); a decimal comma is accepted because kit users type both.
function toNumber(v: unknown): unknown {
  if (v === "" || v === undefined || v === null) return null;
  if (typeof v === "string") return v.trim() === "" ? null : Number(v.trim().replace(",", "."));
  return v;
}

/** A number typed into a form or sent as JSON; empty is null. */
export function optionalNumber(message: string) {
  return z.preprocess(toNumber, z.number({ message }).refine(Number.isFinite, message).nullable());
}

/** A required number, with the same forgiving parsing as optionalNumber. */
export function requiredNumber(message: string) {
  return z.preprocess(toNumber, z.number({ message }).refine(Number.isFinite, message));
}

/** A date-time from a datetime-local input, a Date, or an ISO string. */
export function dateTime(message: string) {
  return z.preprocess(
    (v) => (typeof v === "string" && v.trim() !== "" ? new Date(v) : v instanceof Date ? v : undefined),
    z.date({ message }).refine((d) => !Number.isNaN(d.getTime()), message),
  );
}

export const reasonSchema = z
  .string({ message: "Say why, in a few words." })
  .trim()
  .min(3, "Say why, in a few words.")
  .max(500, "Keep the reason under 500 characters.");

export const optionalNotes = z
  .string()
  .trim()
  .max(1000, "Keep notes under 1,000 characters.")
  .optional()
  .nullable()
  .transform((v) => (v ? v : null));
