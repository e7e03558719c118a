import { z } from "zod";
import { MAX_AMOUNT_MINOR } from "@/lib/money/amounts";
import { rateBp } from "@/app/api/price-list/price-item.schema";

export const scheduleSchema = z
  .object({
    depositBp: rateBp("deposit share"),
    progressBp: rateBp("install-day share"),
    monthlyPlanMinor: z.number().int("Amounts are whole minor units.").min(0, "The monthly amount can't be negative.").max(MAX_AMOUNT_MINOR, "That amount is too large.").nullable(),
    monthlyPlanTaxBp: rateBp("plan's tax rate"),
  })
  .refine((s) => s.depositBp + s.progressBp <= 10_000, { message: "The deposit and install-day shares together can't be more than 100 %.", path: ["progressBp"] });

export type ScheduleInput = z.infer<typeof scheduleSchema>;
