import { z } from "zod";
import { exactText, text } from "@/lib/validation/text";

export const signInSchema = z.object({
  email: text(320).min(1, "Enter your e-mail address.").pipe(z.email("That doesn't look like an e-mail address.")),
  password: exactText(200, "That password is too long.").min(1, "Enter your password."),
});

export type SignInInput = z.infer<typeof signInSchema>;
