import { z } from "zod";
import { PRICE_BASES, QUOTE_GROUPS } from "@/lib/money/quote-lines";
import { MAX_UNIT_PRICE_MINOR } from "@/lib/money/amounts";
import { text } from "@/lib/validation/text";

export const unitPriceMinor = z
  .number({ message: "Enter a price." })
  .int("Prices are whole minor units (cents).")
  .min(0, "A price can't be negative.")
  .max(MAX_UNIT_PRICE_MINOR, "That price is too large.");
export const rateBp = (what: string) =>
  z.number({ message: `Enter the ${what}.` }).int(`The ${what} is in whole basis points (1 % = 100).`).min(0, `The ${what} can't be negative.`).max(10_000, `The ${what} can't be more than 100 %.`);

export const priceItemSchema = z.object({
  group: z.enum(QUOTE_GROUPS, { message: "Choose a group." }),
  label: text(200, "Keep the name under 200 characters.", "Name the item.").min(2, "Name the item."),
  unit: text(20, "Keep the unit short.", "Give the unit (each, m², kg, hour…).").min(1, "Give the unit (each, m², kg, hour…)."),
  unitPriceMinor,
  taxBp: rateBp("tax rate"),
  basis: z.enum(PRICE_BASES, { message: "Choose where the quantity comes from." }),
  panelThicknessMm: z.number().int().min(1).max(100).nullable().default(null),
});

export const priceItemPatchSchema = priceItemSchema.partial().extend({ retired: z.boolean().optional() });

export type PriceItemInput = z.infer<typeof priceItemSchema>;
