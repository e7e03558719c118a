import { z } from "zod";
import { exactText } from "@/lib/validation/text";

export const acceptInvitationSchema = z
  .object({
    token: exactText(100).min(20, "That invitation link is incomplete; open it from the e-mail again."),
    password: exactText(200, "That password is too long.").min(10, "Use at least 10 characters."),
    confirm: exactText(200, "That password is too long."),
  })
  .refine((v) => v.password === v.confirm, { path: ["confirm"], message: "The two passwords don't match." });

export type AcceptInvitationInput = z.infer<typeof acceptInvitationSchema>;
