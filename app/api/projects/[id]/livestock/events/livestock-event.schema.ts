import { z } from "zod";
import { optionalNumber } from "@/lib/validation/number";
import { optionalText } from "@/lib/validation/text";
import { pastDateTime } from "@/lib/validation/fish";
import { COUNTED_KINDS } from "@/lib/stocking/census";

/** Kinds recorded by hand; fish are added only through the plan, after quarantine. */
export const MANUAL_EVENT_KINDS = ["lost", "to_holding", "from_holding", "rehomed", "measured", "behaviour"] as const;

const uuidOrNull = (message: string) =>
  z.preprocess((v) => (v === "" || v === undefined ? null : v), z.string().uuid(message).nullable());

/** One event on a group of fish; which fields it needs depends on its kind. */
export const livestockEventSchema = z
  .object({
    groupId: z.string({ message: "Choose a group of fish." }).uuid("Choose a group of fish."),
    kind: z.enum(MANUAL_EVENT_KINDS, { message: "Choose what happened." }),
    at: pastDateTime("Enter when it happened.").optional(),
    count: optionalNumber("Enter how many fish.").pipe(z.number().int("Enter a whole number of fish.").nullable()),
    place: z.preprocess((v) => (v === "" || v === undefined ? null : v), z.enum(["display", "holding"], { message: "Choose display or holding tank." }).nullable()),
    cause: optionalText(500, "Keep the cause under 500 characters."),
    holdingTankId: uuidOrNull("Choose a holding tank."),
    lengthMm: optionalNumber("Length must be a number.").pipe(z.number().gt(0, "Length must be more than zero.").max(3000, "Over 3 m: check the units (millimetres).").nullable()),
    note: optionalText(1000, "Keep the note under 1,000 characters."),
  })
  .superRefine((v, ctx) => {
    if ((COUNTED_KINDS as string[]).includes(v.kind) && (v.count == null || v.count < 1)) ctx.addIssue({ code: "custom", path: ["count"], message: "Enter how many fish, one or more." });
    if (v.kind === "lost" && !v.cause) ctx.addIssue({ code: "custom", path: ["cause"], message: "Say what the fish died of, or that it's unknown." });
    if (v.kind === "to_holding" && !v.holdingTankId) ctx.addIssue({ code: "custom", path: ["holdingTankId"], message: "Choose the holding tank the fish go to." });
    if (v.kind === "measured" && v.lengthMm == null) ctx.addIssue({ code: "custom", path: ["lengthMm"], message: "Enter the length measured." });
    if (v.kind === "behaviour" && !v.note) ctx.addIssue({ code: "custom", path: ["note"], message: "Describe what you saw: who harassed whom, any fin damage." });
  });

export type LivestockEventInput = z.input<typeof livestockEventSchema>;
export type LivestockEventValues = z.output<typeof livestockEventSchema>;
