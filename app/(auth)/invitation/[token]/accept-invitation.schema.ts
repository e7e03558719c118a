import { z } from "zod";

export const acceptInvitationSchema = z
  .object({
    token: z.string().min(20).max(100),
    password: z.string().min(10, "Use at least 10 characters.").max(200, "That password is too long."),
    confirm: z.string(),
  })
  .refine((v) => v.password === v.confirm, { path: ["confirm"], message: "The two passwords don't match." });

export type AcceptInvitationInput = z.infer<typeof acceptInvitationSchema>;
