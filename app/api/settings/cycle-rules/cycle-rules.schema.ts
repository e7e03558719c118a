import { z } from "zod";
import { optionalNumber } from "@/lib/validation/number";

/**
 * The company's cycle rules as the lead edits them: each left empty keeps the house default.
 * Ranges are checked by validateCycleRules so the form and the gate agree on them.
 */
export const cycleRulesSchema = z.object({
  zeroReadingsNeeded: optionalNumber("Zero readings needed must be a number.").optional(),
  minHoursBetweenZeros: optionalNumber("Hours between zero readings must be a number.").optional(),
  maxAgeHoursOfLatest: optionalNumber("Maximum age of the latest test must be a number of hours.").optional(),
  requireNitrate: z.preprocess(
    (v) => (v === "" || v === undefined ? null : v === "true" ? true : v === "false" ? false : v),
    z.boolean({ message: "Require nitrate must be yes or no." }).nullable(),
  ).optional(),
  clearWithinHoursOfDose: optionalNumber("Hours for a dose to clear must be a number.").optional(),
  stallDays: optionalNumber("Days before a stall must be a number.").optional(),
  stallChangeMgL: optionalNumber("Smallest change must be a number in mg/L.").optional(),
});

export type CycleRulesInput = z.input<typeof cycleRulesSchema>;
export type CycleRulesValues = z.output<typeof cycleRulesSchema>;
