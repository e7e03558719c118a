import { z } from "zod";
import { text } from "@/lib/validation/text";
import { STAGES } from "@/lib/stages/stages";

export const measureSchema = z
  .object({
    unit: text(20, "Keep the unit short.").min(1, "Give the unit, e.g. mm per m."),
    min: z.number({ error: "Enter the lowest allowed value." }).finite(),
    max: z.number({ error: "Enter the highest allowed value." }).finite(),
  })
  .refine((m) => m.max >= m.min, { message: "The highest allowed value must be at least the lowest.", path: ["max"] });

export const newChecklistItemSchema = z.object({
  stage: z.enum(STAGES, { error: "Choose a stage." }),
  label: text(200, "Keep it under 200 characters.").min(3, "Say what to check, in a few words."),
  hint: text(500, "Keep the hint under 500 characters.").optional().nullable(),
  needsPhoto: z.boolean().default(false),
  measure: measureSchema.nullable().default(null),
});

export type NewChecklistItem = z.input<typeof newChecklistItemSchema>;

const id = z.string().uuid("That item wasn't found.");

export const editChecklistItemSchema = z.object({
  label: newChecklistItemSchema.shape.label.optional(),
  hint: newChecklistItemSchema.shape.hint,
  needsPhoto: z.boolean().optional(),
  measure: measureSchema.nullable().optional(),
  /** Retiring is one-way: a retired item stays in the history and off the list. */
  retire: z.literal(true).optional(),
  /** For a move: the item it now follows and the one it now precedes (null at either end). */
  after: id.nullable().optional(),
  before: id.nullable().optional(),
});
