import { z } from "zod";
import { EQUIPMENT_KINDS } from "@/lib/service/equipment-kinds";
import { SERVICE_INTERVAL_LIMITS } from "@/lib/service/equipment-due";
import { dateOnlyOrEmpty, optionalNotes, optionalText, reasonSchema, text } from "@/lib/validation/text";
import { optionalNumber } from "@/lib/validation/number";

const { min, max } = SERVICE_INTERVAL_LIMITS;

/** A date field that may be left empty: "" or absent come out as null. */
const optionalDate = (message: string) =>
  dateOnlyOrEmpty(message)
    .nullish()
    .transform((v) => (v ? v : null));

/** Days between services, or empty for the company's default for the kind. */
export const serviceIntervalField = optionalNumber(`Enter the interval in whole days (${min} to ${max}), or leave it empty.`).pipe(
  z.number().int("Enter whole days.").min(min, `The interval is at least ${min} day.`).max(max, `Keep the interval to ${max} days (ten years) or fewer.`).nullable(),
);

const pieceFields = z.object({
  kind: z.enum(EQUIPMENT_KINDS, { error: "Choose what kind of equipment this is." }),
  makeModel: optionalText(200, "Keep the make and model under 200 characters."),
  installedOn: optionalDate("Enter the install date as a date, or leave it empty."),
  warrantyUntil: optionalDate("Enter the warranty's end as a date, or leave it empty."),
  serviceIntervalDays: serviceIntervalField,
  notes: optionalNotes,
});

function warrantyAfterInstall(v: { installedOn: string | null; warrantyUntil: string | null }, ctx: z.RefinementCtx) {
  if (v.installedOn && v.warrantyUntil && v.warrantyUntil < v.installedOn) ctx.addIssue({ code: "custom", path: ["warrantyUntil"], message: "The warranty can't end before the piece was installed." });
}

/** A piece added to a tank; the last service may be given when the piece was already running. */
export const newEquipmentSchema = pieceFields.extend({ lastServicedOn: optionalDate("Enter the last service as a date, or leave it empty.") }).superRefine(warrantyAfterInstall);

/** A piece's details changed; its services are recorded one by one, not edited here. */
export const equipmentSchema = pieceFields.superRefine(warrantyAfterInstall);

export type NewEquipmentInput = z.input<typeof newEquipmentSchema>;
export type EquipmentInput = z.input<typeof equipmentSchema>;

export const retireEquipmentSchema = z.object({ reason: reasonSchema });

/** A service done outside a visit. `clientKey` comes from the form, so a retried save is applied once. */
export const equipmentServiceSchema = z.object({
  servicedOn: dateOnlyOrEmpty("Enter the day it was serviced as a date.").refine((v) => v !== "", "Enter the day it was serviced."),
  note: optionalText(1000, "Keep the note under 1,000 characters."),
  clientKey: text(100, "That save key is too long.", "The form didn't send its save key; reload the page and try again.").min(8, "The form's save key is too short; reload the page and try again."),
});

export type EquipmentServiceInput = z.input<typeof equipmentServiceSchema>;
