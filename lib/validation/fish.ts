import { z } from "zod";
import { dateTime } from "./text";

/** A little slack for clocks that differ between a phone and the server. */
const FUTURE_TOLERANCE_MS = 5 * 60_000;

/** A date that has already happened: fish records describe the past, never a plan. */
export function pastDateTime(message: string) {
  return dateTime(message).refine((d: Date) => d.getTime() <= Date.now() + FUTURE_TOLERANCE_MS, "That date is in the future; record it once it has happened.");
}

/** A whole number of fish above zero, typed or sent as JSON. */
export const fishCount = z.preprocess(
  (v) => (typeof v === "string" ? (v.trim() === "" ? undefined : Number(v)) : v),
  z.number({ message: "Enter how many fish." }).int("Enter a whole number of fish.").min(1, "At least one fish.").max(10_000, "That's more fish than one tank should hold."),
);
