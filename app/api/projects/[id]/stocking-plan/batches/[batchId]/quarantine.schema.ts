import { z } from "zod";
import { reasonSchema, text } from "@/lib/validation/text";
import { optionalText } from "@/lib/validation/text";
import { pastDateTime } from "@/lib/validation/fish";

export const startQuarantineSchema = z.object({
  holdingTankId: z.string({ message: "Choose a holding tank." }).uuid("Choose a holding tank."),
  startedAt: pastDateTime("Enter when the fish went into the holding tank.").optional(),
});

export const quarantineNoteSchema = z.object({
  kind: z.enum(["observation", "treatment"], { message: "Choose observation or treatment." }),
  at: pastDateTime("Enter when this was seen or given.").optional(),
  text: text(1000, "Keep it under 1,000 characters.", "Say what you saw or gave.").min(3, "Say what you saw or gave."),
});

export const quarantineOverrideSchema = z.object({ reason: reasonSchema });

/** Moving a batch from quarantine into the display; the lead may pass the water re-test rule in writing. */
export const addToDisplaySchema = z.object({
  addedAt: pastDateTime("Enter when the fish went in.").optional(),
  reTestOverride: optionalText(500, "Keep the reason under 500 characters."),
});

export type StartQuarantineInput = z.input<typeof startQuarantineSchema>;
export type QuarantineNoteInput = z.input<typeof quarantineNoteSchema>;
export type AddToDisplayInput = z.input<typeof addToDisplaySchema>;
