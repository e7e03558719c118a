import { z } from "zod";

export const tickSchema = z.object({
  itemId: z.string().uuid("That checklist item wasn't found."),
  done: z.boolean(),
  note: z.string().trim().max(1000, "Keep the note under 1000 characters.").optional().nullable(),
  value: z.number({ error: "Enter a number." }).finite().optional().nullable(),
  attachmentId: z.string().uuid("That photo wasn't found.").optional().nullable(),
  /** Made on the device for each tick, so a retried save is applied once. */
  clientKey: z.string().trim().min(8, "The save key is missing.").max(100),
});

export type TickBody = z.infer<typeof tickSchema>;
