import { z } from "zod";

/** The kit a project reads one analyte with; null goes back to the neutral steps. */
export const kitChoiceSchema = z.object({
  analyte: z.enum(["ammonia", "nitrite", "nitrate"], { message: "Choose ammonia, nitrite or nitrate." }),
  kitId: z.uuid({ message: "Choose one of the company's kits." }).nullable(),
});
