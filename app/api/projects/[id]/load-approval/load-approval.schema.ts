import { z } from "zod";

export const approveLoadSchema = z.object({
  /** Who checked the floor and their reference, when the screening is over the floor's rated load. */
  engineerReference: z.string().trim().max(500, "Keep the engineer's reference under 500 characters.").nullish(),
  /** When the design the lead looked at was saved; a different one means it changed meanwhile. */
  designUpdatedAt: z.iso.datetime({ offset: true, error: "That design date isn't valid." }).nullish(),
});

export const revokeLoadSchema = z.object({
  reason: z.string().trim().min(3, "Say why the approval is withdrawn.").max(1000, "Keep the reason under 1000 characters."),
});

export type ApproveLoadInput = z.infer<typeof approveLoadSchema>;
export type RevokeLoadInput = z.infer<typeof revokeLoadSchema>;
