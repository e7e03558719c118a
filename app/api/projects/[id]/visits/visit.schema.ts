import { z } from "zod";
import { dateTime, text } from "@/lib/validation/text";
import { visitKinds } from "@/db/schema/visits";

export const visitSchema = z.object({
  kind: z.enum(visitKinds, { message: "Choose what the visit is for." }),
  startsAt: dateTime("Enter the visit's date and time."),
  durationMinutes: z.coerce
    .number({ message: "Enter how long the visit takes, in minutes." })
    .int("Use whole minutes.")
    .min(15, "A visit takes at least 15 minutes.")
    .max(24 * 60, "A visit can't be longer than a day; add one per day."),
  notes: text(1000, "Keep the notes under 1000 characters.").optional(),
});

export type VisitInput = z.input<typeof visitSchema>;

export const cancelVisitSchema = z.object({
  reason: text(500, "Keep the reason under 500 characters.", "Say why the visit is cancelled.").min(3, "Say in a few words why the visit is cancelled."),
});
