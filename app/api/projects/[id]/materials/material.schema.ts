import { z } from "zod";
import { text } from "@/lib/validation/text";

export const newMaterialSchema = z.object({
  label: text(200, "Keep it under 200 characters.", "Say what it is.").min(2, "Say what it is."),
  quantity: z.number({ error: "Enter how many or how much." }).finite().positive("The quantity must be more than zero.").max(1e6, "That quantity looks mistyped."),
  unit: text(20, "Keep the unit short.", "Give the unit: bags, kg, pieces…").min(1, "Give the unit: bags, kg, pieces…"),
});

export type NewMaterial = z.infer<typeof newMaterialSchema>;

export const loadedSchema = z.object({ loaded: z.boolean() });
