import { z } from "zod";
import { ROLES } from "@/lib/auth/roles";

/** The lead's change to a person's access: a new role, deactivation or reactivation, or both. */
export const personAccessSchema = z
  .object({
    role: z.enum(ROLES, { message: "Choose project lead, crew or client." }).optional(),
    active: z.boolean({ message: "Say whether the account is active (true or false)." }).optional(),
  })
  .strict()
  .refine((v) => v.role !== undefined || v.active !== undefined, { message: "Say what to change: the role, or whether the account is active." });

export type PersonAccessInput = z.infer<typeof personAccessSchema>;
