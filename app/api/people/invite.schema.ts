import { z } from "zod";
import { text } from "@/lib/validation/text";
import { personNameField, phoneField } from "@/lib/people/contact-fields";

export const inviteSchema = z.object({
  name: personNameField("Enter the person's name."),
  email: text(320).pipe(z.email("Enter a valid e-mail address; the invitation goes there.")),
  role: z.enum(["crew", "client"], { message: "Choose crew or client." }),
  phone: phoneField,
});

export type InviteInput = z.infer<typeof inviteSchema>;
