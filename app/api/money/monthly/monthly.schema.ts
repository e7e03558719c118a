import { z } from "zod";
import { isPeriod } from "@/lib/money/schedule";

export const monthlySchema = z.object({
  period: z.string().refine(isPeriod, "Give the month as YYYY-MM."),
});
