import { z } from "zod";
import { text } from "@/lib/validation/text";

export const restartCycleSchema = z.object({
  reason: text(500, "Keep the reason under 500 characters.", "Say why the cycle starts again.").min(5, "Say in a few words why the cycle starts again."),
});
