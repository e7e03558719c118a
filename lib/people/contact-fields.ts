import { z } from "zod";
import { text } from "../validation/text";

/** An optional phone number as people type them: digits, spaces, +, brackets and dashes. */
export const phoneField = text(40, "That phone number is too long.")
  .regex(/^[+0-9 ()-]*$/, "Use digits, spaces, +, ( ) and - only.")
  .optional()
  .or(z.literal(""));

/** A person's name; `missing` is the message when it is left empty. */
export const personNameField = (missing: string) => text(120, "Keep the name under 120 characters.", missing).min(2, missing);
