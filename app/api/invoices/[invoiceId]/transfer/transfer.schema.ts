import { z } from "zod";
import { MAX_AMOUNT_MINOR } from "@/lib/money/amounts";
import { dateOnlyOrEmpty, text } from "@/lib/validation/text";

export const transferSchema = z.object({
  amountMinor: z.number({ message: "Enter the amount received." }).int("Amounts are whole minor units.").min(1, "Enter the amount received.").max(MAX_AMOUNT_MINOR, "That amount is too large."),
  receivedOn: dateOnlyOrEmpty("Give the date the money arrived (YYYY-MM-DD).").refine((v) => v !== "", "Give the date the money arrived (YYYY-MM-DD)."),
  reference: text(200, "Keep the reference under 200 characters.", "Give the bank's reference for the transfer.").min(2, "Give the bank's reference for the transfer."),
});
