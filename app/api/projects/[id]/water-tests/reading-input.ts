import "server-only";
import { badRequest, type FieldErrors } from "@/server/errors";
import { validateReading } from "@/lib/cycling/readings";
import { fahrenheitToCelsius } from "@/lib/tank/units";
import type { ReadingValues } from "@/db/queries/water";
import type { WaterTestValues } from "./water-test.schema";

// validateReading speaks of stored fields; the form's temperature field holds the person's unit.
const FORM_FIELD: Record<string, string> = { tempC: "temperature" };

/**
 * Turns a parsed water test into SI values and runs the plausibility checks, answering 400 with a
 * message per field when anything is impossible (nothing is saved).
 */
export function readingFromInput(input: WaterTestValues, unitSystem: "metric" | "imperial", now: Date): ReadingValues {
  const unit = input.temperatureUnit ?? (unitSystem === "imperial" ? "F" : "C");
  const tempC = input.temperature == null ? null : unit === "F" ? fahrenheitToCelsius(input.temperature) : input.temperature;
  const values: ReadingValues = {
    takenAt: input.takenAt,
    ammoniaMgL: input.ammoniaMgL,
    nitriteMgL: input.nitriteMgL,
    nitrateMgL: input.nitrateMgL,
    pH: input.pH,
    tempC,
    khDkh: input.khDkh,
    salinityPpt: input.salinityPpt,
    notes: input.notes,
  };
  const problems = validateReading(values, now);
  if (problems.length) {
    const fields: FieldErrors = {};
    for (const p of problems) {
      const key = FORM_FIELD[p.field] ?? p.field;
      fields[key] ??= p.field === "tempC" && unit === "F" ? "Temperature must be between 32 and 104 °F." : p.message;
    }
    throw badRequest("Some readings can't be right; check the highlighted fields. Nothing was saved.", fields);
  }
  return values;
}
