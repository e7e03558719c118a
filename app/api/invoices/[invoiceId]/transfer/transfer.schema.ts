import { z } from "zod";
import { MAX_AMOUNT_MINOR } from "@/lib/money/amounts";

export const transferSchema = z.object({
  amountMinor: z.number({ message: "Enter the amount received." }).int("Amounts are whole minor units.").min(1, "Enter the amount received.").max(MAX_AMOUNT_MINOR, "That amount is too large."),
  receivedOn: z.string().regex(/^\d{4}-\d{2}-\d{2}$/, "Give the date the money arrived (YYYY-MM-DD)."),
  reference: z.string().trim().min(2, "Give the bank's reference for the transfer.").max(200),
});
