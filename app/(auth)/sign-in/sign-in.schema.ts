import { z } from "zod";

export const signInSchema = z.object({
  email: z.string().trim().min(1, "Enter your e-mail address.").max(320).email("That doesn't look like an e-mail address."),
  password: z.string().min(1, "Enter your password.").max(200, "That password is too long."),
});

export type SignInInput = z.infer<typeof signInSchema>;
