import { z } from "zod";
import { text } from "@/lib/validation/text";
import { STAGES } from "@/lib/stages/stages";
import { UUID_PATTERN } from "@/lib/stages/ids";

const cardId = z.string().regex(UUID_PATTERN, "That neighbouring card isn't one on the board.");

/** A card dropped on the board: which column, next to which card (or at which index), and the version the mover saw. */
export const moveSchema = z
  .object({
    toStage: z.enum(STAGES, { message: "Choose one of the board's stages." }),
    beforeId: cardId.optional(),
    afterId: cardId.optional(),
    position: z.number().int("The position is a whole number.").min(0, "The position starts at 0.").max(100_000).optional(),
    version: z.number({ message: "The card's version is missing; reload the board and try again." }).int().min(1),
    reason: text(500, "Keep the reason under 500 characters.").optional(),
    overrideReason: text(500, "Keep the reason under 500 characters.").min(5, "Say in a few words why the gate may be passed.").optional(),
  })
  .refine((v) => [v.beforeId, v.afterId, v.position].filter((x) => x !== undefined).length <= 1, {
    message: "Give one of beforeId, afterId or position.",
    path: ["position"],
  });

export type MoveRequest = z.infer<typeof moveSchema>;
