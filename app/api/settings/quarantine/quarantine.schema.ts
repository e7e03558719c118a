import { z } from "zod";
import { requiredNumber } from "@/lib/validation/number";
import { QUARANTINE_DAYS_LIMITS } from "@/lib/stocking/quarantine";

export const quarantineSettingSchema = z.object({
  quarantineDays: requiredNumber("Enter the quarantine period in days.").pipe(
    z
      .number()
      .int("Enter whole days.")
      .min(QUARANTINE_DAYS_LIMITS.min, "The period can't be negative.")
      .max(QUARANTINE_DAYS_LIMITS.max, `Keep it to ${QUARANTINE_DAYS_LIMITS.max} days or fewer.`),
  ),
});

export type QuarantineSettingInput = z.input<typeof quarantineSettingSchema>;
