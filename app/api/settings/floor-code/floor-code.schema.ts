import { z } from "zod";
import { FLOOR_CODES } from "@/lib/tank/floor-codes";

/** The building code the company screens floors against. */
export const floorCodeSchema = z.object({
  floorCode: z.enum(FLOOR_CODES as unknown as ["us-irc", "en-uk"], { error: "Choose one of the building codes listed." }),
});

export type FloorCodeInput = z.infer<typeof floorCodeSchema>;
