import { z } from "zod";
import { text } from "@/lib/validation/text";

export const noteSchema = z.object({
  body: text(4000, "Keep a note under 4000 characters.", "Write the note first.").min(1, "Write the note first."),
  shared: z.boolean({ message: "Say whether the client sees this note." }),
});

export const noteSharingSchema = z.object({
  shared: z.boolean({ message: "Say whether the client sees this note." }),
});

export type NoteInput = z.infer<typeof noteSchema>;
