import { z } from "zod";
import { parseSteps } from "@/lib/cycling/test-kits";

/** A kit as the lead describes it. Steps arrive as typed ("0, 0.5, 1"); their order and range are checked by validateKit. */
export const testKitSchema = z.object({
  name: z.string({ message: "Give the kit a name." }).max(200, "Keep the name under 60 characters."),
  analyte: z.enum(["ammonia", "nitrite", "nitrate"], { message: "Choose what the kit tests: ammonia, nitrite or nitrate." }),
  basis: z.enum(["compound", "nitrogen"], { message: "Choose how the kit prints its result." }),
  steps: z
    .string({ message: "List the kit's steps, separated by commas." })
    .max(300, "That is too many steps.")
    .transform((s) => parseSteps(s)),
});

export type TestKitInput = z.input<typeof testKitSchema>;
export type TestKitValues = z.output<typeof testKitSchema>;
