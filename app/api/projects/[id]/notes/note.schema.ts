import { z } from "zod";

export const noteSchema = z.object({
  body: z.string({ message: "Write the note first." }).trim().min(1, "Write the note first.").max(4000, "Keep a note under 4000 characters."),
  shared: z.boolean({ message: "Say whether the client sees this note." }),
});

export const noteSharingSchema = z.object({
  shared: z.boolean({ message: "Say whether the client sees this note." }),
});

export type NoteInput = z.infer<typeof noteSchema>;
