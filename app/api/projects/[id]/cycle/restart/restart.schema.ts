import { z } from "zod";

export const restartCycleSchema = z.object({
  reason: z.string({ message: "Say why the cycle starts again." }).trim().min(5, "Say in a few words why the cycle starts again.").max(500, "Keep the reason under 500 characters."),
});
