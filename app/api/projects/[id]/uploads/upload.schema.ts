import { z } from "zod";
import { STAGES } from "@/lib/stages/stages";

/** What the device says about a file before sending it; the server checks the bytes afterwards. */
export const uploadSchema = z.object({
  fileName: z.string().min(1, "The file needs a name.").max(1000, "The file name is too long."),
  contentType: z.string().max(200).default(""),
  sizeBytes: z.number({ error: "The file size is missing." }).int().nonnegative(),
  stage: z.enum(STAGES, { error: "Choose the stage this belongs to." }),
  caption: z.string().trim().max(300, "Keep the caption under 300 characters.").optional().nullable(),
  isProblem: z.boolean().optional().default(false),
});

export type UploadBody = z.infer<typeof uploadSchema>;
