import { z } from "zod";
import { QUOTE_GROUPS } from "@/lib/money/quote-lines";
import { MAX_QUANTITY_MILLI } from "@/lib/money/amounts";
import { rateBp, unitPriceMinor } from "@/app/api/price-list/price-item.schema";
import { text } from "@/lib/validation/text";

export const quoteLineSchema = z.object({
  group: z.enum(QUOTE_GROUPS, { message: "Choose a group." }),
  description: text(300, "Keep a line under 300 characters.", "Describe the line.").min(1, "Describe the line."),
  unit: text(20, "Keep the unit short.", "Give the unit.").min(1, "Give the unit."),
  quantityMilli: z
    .number({ message: "Enter a quantity." })
    .int("Quantities are in thousandths.")
    .min(0, "A quantity can't be negative.")
    .max(MAX_QUANTITY_MILLI, "That quantity is too large."),
  unitPriceMinor,
  discountBp: rateBp("discount"),
  taxBp: rateBp("tax rate"),
  priceItemId: z.string().uuid().nullable().default(null),
});

export const saveQuoteSchema = z.object({
  lines: z.array(quoteLineSchema).max(200, "A quote can have up to 200 lines."),
  notes: text(4000, "Keep the notes under 4,000 characters.").default(""),
});

export const newQuoteSchema = z.object({
  from: z.enum(["design", "current"], { message: "Start from the design or from the current quote." }),
});

export const acceptQuoteSchema = z.object({
  typedName: text(200, "That is longer than a name.", "Type your full name to accept.").min(2, "Type your full name to accept."),
  seenHash: z.string().regex(/^[0-9a-f]{64}$/, "Reload the quote and try again."),
});

export type SaveQuoteInput = z.infer<typeof saveQuoteSchema>;
export type QuoteLineInput = z.infer<typeof quoteLineSchema>;
