import { z } from "zod";
import { optionalNumber } from "@/lib/validation/number";
import { optionalText } from "@/lib/validation/text";
import { fishCount } from "@/lib/validation/fish";

/** A batch of the stocking plan: species from the catalogue with their counts. */
export const planBatchSchema = z.object({
  items: z
    .array(z.object({ speciesId: z.string().uuid("Choose a species from the catalogue."), count: fishCount }), { message: "Add at least one species." })
    .min(1, "Add at least one species.")
    .max(30, "Keep a batch under 30 species."),
  note: optionalText(500, "Keep the note under 500 characters."),
});

/** The plan's settings: a reef (coral and invertebrate checks) and the pH the lead aims for. */
export const planSettingsSchema = z.object({
  reef: z.preprocess((v) => (v === "true" ? true : v === "false" ? false : v), z.boolean({ message: "Say whether this is a reef." })),
  targetPh: optionalNumber("pH must be a number.").pipe(z.number().min(4, "pH below 4 isn't a fish tank.").max(10, "pH above 10 isn't a fish tank.").nullable()),
});

export type PlanBatchInput = z.input<typeof planBatchSchema>;
export type PlanBatchValues = z.output<typeof planBatchSchema>;
export type PlanSettingsInput = z.input<typeof planSettingsSchema>;
export type PlanSettingsValues = z.output<typeof planSettingsSchema>;
