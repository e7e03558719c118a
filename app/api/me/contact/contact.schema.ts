import { z } from "zod";
import { personNameField, phoneField } from "@/lib/people/contact-fields";

export const contactSchema = z.object({
  name: personNameField("Enter your name."),
  phone: phoneField,
});

export type ContactInput = z.infer<typeof contactSchema>;
