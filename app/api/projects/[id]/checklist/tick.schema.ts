import { z } from "zod";
import { text } from "@/lib/validation/text";

export const tickSchema = z.object({
  itemId: z.string().uuid("That checklist item wasn't found."),
  done: z.boolean(),
  note: text(1000, "Keep the note under 1000 characters.").optional().nullable(),
  value: z.number({ error: "Enter a number." }).finite().optional().nullable(),
  attachmentId: z.string().uuid("That photo wasn't found.").optional().nullable(),
  /** Made on the device for each tick, so a retried save is applied once. */
  clientKey: text(100).min(8, "The save key is missing."),
});

export type TickBody = z.infer<typeof tickSchema>;
