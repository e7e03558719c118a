import { z } from "zod";

export const recaptionSchema = z.object({
  caption: z.string({ message: "Write the caption, or leave it empty to remove it." }).trim().max(300, "Keep a caption under 300 characters."),
});

export const voidPhotoSchema = z.object({
  reason: z.string({ message: "Say why the photo is being voided." }).trim().min(3, "Say in a few words why the photo is being voided.").max(500, "Keep the reason under 500 characters."),
});
