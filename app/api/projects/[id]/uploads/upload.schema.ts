import { z } from "zod";
import { exactText, isoInstant, text } from "@/lib/validation/text";
import { STAGES } from "@/lib/stages/stages";

/** What the device says about a file before sending it; the server checks the bytes afterwards. */
export const uploadSchema = z.object({
  fileName: exactText(1000, "The file name is too long.").min(1, "The file needs a name."),
  contentType: text(200).default(""),
  sizeBytes: z.number({ error: "The file size is missing." }).int().nonnegative().max(Number.MAX_SAFE_INTEGER),
  stage: z.enum(STAGES, { error: "Choose the stage this belongs to." }),
  caption: text(300, "Keep the caption under 300 characters.").optional().nullable(),
  isProblem: z.boolean().optional().default(false),
  /** The device's own key for this photo: sending it again returns the first upload. */
  clientKey: z
    .string({ error: "The upload key must be text." })
    .regex(/^[A-Za-z0-9_-]{8,80}$/, "The upload key must be 8 to 80 letters, digits, dashes or underscores.")
    .optional()
    .nullable(),
  /** When the camera took it (its own clock), as an ISO instant with an offset. */
  takenAt: isoInstant("The time the photo was taken isn't a valid date.").optional().nullable(),
});

export type UploadBody = z.infer<typeof uploadSchema>;
