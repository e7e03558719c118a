import { z } from "zod";
import { requiredNumber } from "@/lib/validation/number";

export const holdingTankSchema = z.object({
  name: z.string({ message: "Name the tank." }).trim().min(2, "Name the tank.").max(80, "Keep the name under 80 characters."),
  volumeL: requiredNumber("Enter the volume in litres.").pipe(z.number().gt(0, "The volume must be more than zero.").max(20_000, "Over 20,000 L: check the units (litres).")),
  location: z.string({ message: "Say where the tank is." }).trim().min(2, "Say where the tank is.").max(120, "Keep the location under 120 characters."),
});

export type HoldingTankInput = z.input<typeof holdingTankSchema>;
