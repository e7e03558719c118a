import { z } from "zod";
import { text } from "@/lib/validation/text";
import { requiredNumber } from "@/lib/validation/number";

export const holdingTankSchema = z.object({
  name: text(80, "Keep the name under 80 characters.", "Name the tank.").min(2, "Name the tank."),
  volumeL: requiredNumber("Enter the volume in litres.").pipe(z.number().gt(0, "The volume must be more than zero.").max(20_000, "Over 20,000 L: check the units (litres).")),
  location: text(120, "Keep the location under 120 characters.", "Say where the tank is.").min(2, "Say where the tank is."),
});

export type HoldingTankInput = z.input<typeof holdingTankSchema>;
