import { z } from "zod";

export const unitSystemSchema = z.object({
  unitSystem: z.enum(["metric", "imperial"], { error: "Choose metric or imperial units." }),
});

export type UnitSystemInput = z.infer<typeof unitSystemSchema>;
