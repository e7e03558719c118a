import { z } from "zod";

export const inviteSchema = z.object({
  name: z.string().trim().min(2, "Enter the person's name.").max(120, "Keep the name under 120 characters."),
  email: z.string().trim().max(320).email("Enter a valid e-mail address; the invitation goes there."),
  role: z.enum(["crew", "client"], { message: "Choose crew or client." }),
  phone: z
    .string()
    .trim()
    .max(40, "That phone number is too long.")
    .regex(/^[+0-9 ()-]*$/, "Use digits, spaces, +, ( ) and - only.")
    .optional()
    .or(z.literal("")),
});

export type InviteInput = z.infer<typeof inviteSchema>;

export const resendSchema = z.object({ userId: z.string().uuid("That person wasn't found.") });
