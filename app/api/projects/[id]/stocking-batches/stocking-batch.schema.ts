import { z } from "zod";
import { optionalNumber, requiredNumber } from "@/lib/validation/number";
import { dateTime, optionalText, text } from "@/lib/validation/text";

/** A batch of fish added to the tank; the lead may pass the re-test rule with a written reason. */
export const stockingBatchSchema = z.object({
  addedAt: dateTime("Enter when the fish went in.").optional(),
  description: text(500, "Keep the description under 500 characters.", "Describe the batch.").min(3, "Describe the batch: which fish, from where."),
  fishCount: requiredNumber("Enter how many fish.").pipe(
    z.number().int("Enter a whole number of fish.").min(1, "At least one fish.").max(10_000, "That's more fish than one batch should hold."),
  ),
  quarantineDays: optionalNumber("Quarantine must be a number of days.").pipe(
    z.number().int("Enter whole days.").min(0, "Quarantine can't be negative.").max(365, "Quarantine longer than a year isn't believable.").nullable(),
  ),
  overrideReason: optionalText(500, "Keep the reason under 500 characters."),
});

export type StockingBatchInput = z.input<typeof stockingBatchSchema>;
export type StockingBatchValues = z.output<typeof stockingBatchSchema>;
