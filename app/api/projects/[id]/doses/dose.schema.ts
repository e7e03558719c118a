import { z } from "zod";
import { optionalNumber, requiredNumber } from "@/lib/validation/number";
import { dateTime, optionalNotes } from "@/lib/validation/text";

/** An ammonia dose given during a fishless cycle (mg/L as NH3, mL, % w/w). */
export const doseSchema = z.object({
  dosedAt: dateTime("Enter when the dose was added."),
  targetMgL: requiredNumber("Enter the ammonia level the dose aims for, in mg/L.").pipe(
    z.number().gt(0, "The target must be above 0 mg/L.").max(50, "A target above 50 mg/L isn't believable; check the units."),
  ),
  amountMl: optionalNumber("Amount must be a number in mL.").pipe(
    z.number().gt(0, "Amount must be above 0 mL.").max(100_000, "That amount is too large; check the units.").nullable(),
  ),
  sourcePercent: optionalNumber("Strength must be a number in %.").pipe(
    z.number().gt(0, "Strength must be above 0 %.").max(100, "Strength can't be above 100 %.").nullable(),
  ),
  notes: optionalNotes,
});

export type DoseInput = z.input<typeof doseSchema>;
export type DoseValues = z.output<typeof doseSchema>;
