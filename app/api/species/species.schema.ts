import { z } from "zod";
import { text, optionalText } from "@/lib/validation/text";
import { optionalNumber, requiredNumber } from "@/lib/validation/number";
import { DIETS, SWIM_LEVELS, TEMPERAMENTS, WATER_KINDS } from "@/lib/stocking/species";

const yesNo = (message: string) => z.preprocess((v) => (v === "" || v === undefined ? null : v === "true" ? true : v === "false" ? false : v), z.boolean({ message }).nullable());
// A checkbox: a form posts "on" or "true" when ticked and nothing when not; any other value is refused.
const flag = z.preprocess((v) => (v === "on" || v === "true" ? true : v === undefined || v === "false" ? false : v), z.boolean({ message: "Tick it or leave it empty." }));

/** A catalogue entry as the lead edits it; temperatures °C, lengths mm. */
export const speciesSchema = z
  .object({
    commonName: text(80, "Keep it under 80 characters.", "Enter the common name.").min(2, "Enter the common name."),
    scientificName: z.string({ message: "Enter the scientific name." }).trim().regex(/^[A-Z][a-z]+ [a-z.-]+( [a-z.-]+)?$/, "Write it as genus and species, e.g. Genus species."),
    water: z.enum(WATER_KINDS, { message: "Choose fresh, brackish or salt water." }),
    tempMinC: requiredNumber("Enter the lowest temperature.").pipe(z.number().min(0, "Below 0 °C isn't believable.").max(40, "Above 40 °C isn't believable.")),
    tempMaxC: requiredNumber("Enter the highest temperature.").pipe(z.number().min(0, "Below 0 °C isn't believable.").max(40, "Above 40 °C isn't believable.")),
    phMin: requiredNumber("Enter the lowest pH.").pipe(z.number().min(4, "pH below 4 isn't a fish tank.").max(10, "pH above 10 isn't a fish tank.")),
    phMax: requiredNumber("Enter the highest pH.").pipe(z.number().min(4, "pH below 4 isn't a fish tank.").max(10, "pH above 10 isn't a fish tank.")),
    adultLengthMm: requiredNumber("Enter the adult length in mm.").pipe(z.number().int("Whole millimetres.").min(5, "At least 5 mm.").max(3000, "Over 3 m: check the units (millimetres).")),
    temperament: z.enum(TEMPERAMENTS, { message: "Choose a temperament." }),
    territorial: flag,
    shoalMin: requiredNumber("Enter the smallest group (1 if kept alone).").pipe(z.number().int("A whole number.").min(1, "At least 1.").max(100, "Over 100 isn't believable.")),
    level: z.enum(SWIM_LEVELS, { message: "Choose where it swims." }),
    coralSafe: yesNo("Say whether it is safe with corals."),
    invertSafe: yesNo("Say whether it is safe with invertebrates."),
    diet: z.enum(DIETS, { message: "Choose a diet." }),
    minTankLengthMm: optionalNumber("Minimum tank length must be a number of mm.").pipe(z.number().int("Whole millimetres.").min(100, "At least 100 mm.").max(10_000, "Over 10 m: check the units.").nullable()),
    notes: optionalText(1000, "Keep notes under 1,000 characters."),
    source: text(200, "Keep it under 200 characters.", "Say where the values come from.").min(3, "Say where the values come from: \"from memory\" or the handbook's name."),
  })
  .superRefine((v, ctx) => {
    if (v.tempMinC > v.tempMaxC) ctx.addIssue({ code: "custom", path: ["tempMaxC"], message: "The highest temperature is below the lowest." });
    if (v.phMin > v.phMax) ctx.addIssue({ code: "custom", path: ["phMax"], message: "The highest pH is below the lowest." });
  });

export type SpeciesInput = z.input<typeof speciesSchema>;
export type SpeciesValues = z.output<typeof speciesSchema>;
