import { z } from "zod";
import { text } from "@/lib/validation/text";
import { LEAK_KINDS } from "@/lib/install/leak-rules";

export const leakCheckSchema = z
  .object({
    kind: z.enum(LEAK_KINDS, { error: "Choose what is being recorded." }),
    passed: z.boolean({ error: "Say whether it passed." }),
    note: text(1000, "Keep the note under 1000 characters.").optional().nullable(),
    /** The fill only: measured hose flow and conditioner added. */
    hoseFlowLPerMin: z.number().finite().positive("The hose flow must be more than zero.").max(500, "That hose flow looks mistyped.").optional().nullable(),
    conditionerMl: z.number().finite().nonnegative("The conditioner can't be negative.").max(100_000, "That dose looks mistyped.").optional().nullable(),
  })
  .refine((v) => v.passed || !!v.note?.trim(), { message: "Say where the leak is and what was done.", path: ["note"] });

export type LeakCheckBody = z.input<typeof leakCheckSchema>;
