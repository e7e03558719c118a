import { z } from "zod";
import { optionalNumber } from "@/lib/validation/number";

const days = (label: string) =>
  optionalNumber(`${label}: give a number of days.`)
    .refine((v) => v === null || (Number.isInteger(v) && v >= 1 && v <= 365), `${label}: a whole number of days from 1 to 365.`)
    .optional();

/**
 * The company's timing settings as the lead edits them: expected days per stage (empty keeps the
 * house default) and how long stage-change and shared-note e-mails wait in the outbox.
 */
export const timingSchema = z.object({
  stageDurations: z.object({
    site_survey: days("Site survey"),
    stand_load_check: days("Stand & load check"),
    aquascape: days("Aquascape"),
    fill_leak_test: days("Fill & leak test"),
    cycling: days("Cycling"),
    first_stocking: days("First stocking"),
  }),
  noticeDelayMinutes: optionalNumber("The e-mail hold must be a number of minutes.")
    .refine((v) => v === null || (v >= 0 && v <= 60), "Hold e-mails from 0 to 60 minutes.")
    .optional(),
});

export type TimingInput = z.input<typeof timingSchema>;
export type TimingValues = z.output<typeof timingSchema>;
