import { z } from "zod";
import { dateOnlyOrEmpty, dateTime, reasonSchema, text } from "@/lib/validation/text";
import { optionalNumber } from "@/lib/validation/number";
import { MAX_WEEKS_APART, WEEKDAYS } from "@/lib/service/recurrence";

const uuidOrNull = (message: string) => z.union([z.literal(""), z.null(), z.string().uuid(message)]).transform((v) => (v ? v : null));

/** The tank's service plan as the lead edits it; the recurrence is turned into an RRULE on the server. */
export const planSchema = z
  .object({
    frequency: z.enum(["weekly", "monthly"], { message: "Choose weekly or monthly." }),
    everyWeeks: z.coerce
      .number({ message: "Enter how many weeks apart." })
      .int("Use whole weeks.")
      .min(1, "At least every week.")
      .max(MAX_WEEKS_APART, `At most every ${MAX_WEEKS_APART} weeks; longer gaps suit a monthly plan.`)
      .default(1),
    weekday: z.enum(WEEKDAYS, { message: "Choose the day of the week." }).default("MO"),
    dayOfMonth: z.coerce.number({ message: "Enter the day of the month." }).int("Use a whole day.").min(1, "Days start at 1.").max(31, "A month has at most 31 days.").default(1),
    startsOn: dateOnlyOrEmpty("Enter the first day of the plan.").refine((v) => v !== "", "Enter the first day of the plan."),
    startTime: z.string({ message: "Enter the visit's start time." }).regex(/^([01]\d|2[0-3]):[0-5]\d$/, "Enter the start time as HH:MM, e.g. 09:00."),
    durationMinutes: z.coerce.number({ message: "Enter how long a visit takes." }).int("Use whole minutes.").min(15, "A visit takes at least 15 minutes.").max(12 * 60, "A routine visit can't be longer than 12 hours."),
    waterChangePercent: z.coerce.number({ message: "Enter the water change as a percentage." }).min(0, "The water change can't be below 0 %.").max(100, "The water change can't be over 100 %."),
    tasks: z
      .array(text(200, "Keep each task under 200 characters.").min(1, "A task needs a few words."), { message: "List the visit's tasks." })
      .max(40, "Keep a routine visit to 40 tasks or fewer."),
    usualAssigneeId: uuidOrNull("Choose someone from the list."),
    version: z.number().int().positive().nullable().optional(),
  })
  .refine((v) => new Set(v.tasks).size === v.tasks.length, { message: "Each task appears once.", path: ["tasks"] });

export type PlanBody = z.input<typeof planSchema>;

export const moveVisitSchema = z.object({
  startsAt: dateTime("Enter the visit's new date and time."),
  assignedTo: uuidOrNull("Choose someone from the list."),
});

export const skipVisitSchema = z.object({ reason: reasonSchema });
export const reopenSchema = z.object({ reason: reasonSchema });

export const visitTickSchema = z.object({
  taskIndex: z.number({ message: "That task wasn't found." }).int().min(0).max(100),
  done: z.boolean({ message: "Say whether the task is done." }),
  /** Made on the device for each tick, so a retried save is applied once. */
  clientKey: text(100).min(8, "The save key is missing."),
});

const notes = (what: string) => text(2000, `Keep the ${what} under 2,000 characters.`).nullable().optional();

/** The report's written parts; a field left out keeps its value. */
export const reportSchema = z.object({
  waterChangeL: optionalNumber("Enter the water changed in litres.")
    .refine((v) => v == null || (v >= 0 && v <= 100_000), "Enter the litres changed, from 0 to 100,000.")
    .optional(),
  livestockNote: notes("livestock note"),
  clientNotes: notes("notes for the client"),
  internalNotes: notes("internal notes"),
});

export const equipmentServiceSchema = z.object({
  equipmentId: z.string().uuid("That piece of equipment wasn't found."),
  note: text(500, "Keep the note under 500 characters.").nullable().optional(),
  clientKey: text(100).min(8, "The save key is missing."),
});

export const visitPhotoSchema = z.object({ attachmentId: z.string().uuid("That photo wasn't found.") });
