import { z } from "zod";
import { isoInstant, text } from "@/lib/validation/text";

export const approveLoadSchema = z.object({
  /** Who checked the floor and their reference, when the screening is over the floor's rated load. */
  engineerReference: text(500, "Keep the engineer's reference under 500 characters.").nullish(),
  /** When the design the lead looked at was saved; a different one means it changed meanwhile. */
  designUpdatedAt: isoInstant("That design date isn't valid.").nullish(),
});

export const revokeLoadSchema = z.object({
  reason: text(1000, "Keep the reason under 1000 characters.", "Say why the approval is withdrawn.").min(3, "Say why the approval is withdrawn."),
});

export type ApproveLoadInput = z.infer<typeof approveLoadSchema>;
export type RevokeLoadInput = z.infer<typeof revokeLoadSchema>;
