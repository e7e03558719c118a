import { z } from "zod";

export const newMaterialSchema = z.object({
  label: z.string().trim().min(2, "Say what it is.").max(200, "Keep it under 200 characters."),
  quantity: z.number({ error: "Enter how many or how much." }).finite().positive("The quantity must be more than zero.").max(1e6, "That quantity looks mistyped."),
  unit: z.string().trim().min(1, "Give the unit: bags, kg, pieces…").max(20, "Keep the unit short."),
});

export type NewMaterial = z.infer<typeof newMaterialSchema>;

export const loadedSchema = z.object({ loaded: z.boolean() });
