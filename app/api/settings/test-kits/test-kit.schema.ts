import { z } from "zod";
import { parseSteps } from "@/lib/cycling/test-kits";
import { text } from "@/lib/validation/text";

/** A kit as the lead describes it. Steps arrive as typed ("0, 0.5, 1"); their order and range are checked by validateKit. */
export const testKitSchema = z.object({
  name: text(60, "Keep the name under 60 characters.", "Give the kit a name."),
  analyte: z.enum(["ammonia", "nitrite", "nitrate"], { message: "Choose what the kit tests: ammonia, nitrite or nitrate." }),
  basis: z.enum(["compound", "nitrogen"], { message: "Choose how the kit prints its result." }),
  steps: text(300, "That is too many steps.", "List the kit's steps, separated by commas.").transform((s) => parseSteps(s)),
});

export type TestKitInput = z.input<typeof testKitSchema>;
export type TestKitValues = z.output<typeof testKitSchema>;
