import { z } from "zod";
import { text } from "@/lib/validation/text";

export const recaptionSchema = z.object({
  caption: text(300, "Keep a caption under 300 characters.", "Write the caption, or leave it empty to remove it."),
});

export const voidPhotoSchema = z.object({
  reason: text(500, "Keep the reason under 500 characters.", "Say why the photo is being voided.").min(3, "Say in a few words why the photo is being voided."),
});
