import { z } from "zod";
import { rateBp } from "@/app/api/price-list/price-item.schema";

export const moneySettingsSchema = z
  .object({
    currency: z
      .string()
      .trim()
      .regex(/^[A-Za-z]{3}$/, "Use the currency's three-letter code.")
      .transform((s) => s.toUpperCase()),
    depositBp: rateBp("deposit share"),
    progressBp: rateBp("install-day share"),
    defaultTaxBp: rateBp("default tax rate"),
    paymentTermsDays: z.number({ message: "Enter the payment terms in days." }).int().min(0, "Terms can't be negative.").max(365, "Terms can't be over a year."),
  })
  .refine((s) => s.depositBp + s.progressBp <= 10_000, { message: "The deposit and install-day shares together can't be more than 100 %.", path: ["progressBp"] });

export type MoneySettingsInput = z.infer<typeof moneySettingsSchema>;
