import { z } from "zod";
import { optionalNumber } from "@/lib/validation/number";
import { dateTime, optionalNotes, reasonSchema } from "@/lib/validation/text";

/**
 * A water test as entered. Temperature is in the unit named by `temperatureUnit` (the person's own
 * unit system when left out) and is stored in °C; plausibility limits are checked by
 * validateReading after this shape check.
 */
export const waterTestSchema = z
  .object({
    takenAt: dateTime("Enter when the test was taken."),
    ammoniaMgL: optionalNumber("Ammonia must be a number in mg/L."),
    nitriteMgL: optionalNumber("Nitrite must be a number in mg/L."),
    nitrateMgL: optionalNumber("Nitrate must be a number in mg/L."),
    pH: optionalNumber("pH must be a number."),
    temperature: optionalNumber("Temperature must be a number."),
    temperatureUnit: z.enum(["C", "F"], { message: "Temperature unit must be C or F." }).optional(),
    khDkh: optionalNumber("KH must be a number in dKH."),
    salinityPpt: optionalNumber("Salinity must be a number in ppt."),
    notes: optionalNotes,
  })
  .refine((v) => [v.ammoniaMgL, v.nitriteMgL, v.nitrateMgL, v.pH, v.temperature, v.khDkh, v.salinityPpt].some((x) => x !== null), {
    message: "Enter at least one result.",
    path: ["ammoniaMgL"],
  });

export type WaterTestInput = z.input<typeof waterTestSchema>;
export type WaterTestValues = z.output<typeof waterTestSchema>;

/** A lead's correction: the corrected reading and why the old one was wrong. */
export const correctWaterTestSchema = z.intersection(waterTestSchema, z.object({ reason: reasonSchema }));

export const voidSchema = z.object({ reason: reasonSchema });
export type VoidInput = z.input<typeof voidSchema>;
