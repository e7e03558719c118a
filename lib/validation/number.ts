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
