import { z } from "zod";
import { UUID_PATTERN } from "@/lib/stages/ids";
import { dateOnlyOrEmpty, text } from "@/lib/validation/text";

const dateOrEmpty = dateOnlyOrEmpty();

/** A change to a project's details; only the fields sent are changed. `version` guards against overwriting someone else's change. */
export const projectDetailsSchema = z.object({
  version: z.number({ message: "The card's version is missing; reload and try again." }).int().min(1),
  title: text(120, "Keep the title under 120 characters.").min(2, "Give the project a title.").optional(),
  siteAddress: text(200, "Keep the address under 200 characters.").min(3, "Enter the site's street address.").optional(),
  siteTown: text(80, "Keep the town under 80 characters.").min(2, "Enter the site's town.").optional(),
  targetInstallDate: dateOrEmpty.optional(),
  targetHandoverDate: dateOrEmpty.optional(),
  tankSummary: text(200, "Keep the tank summary under 200 characters.").optional(),
  crewIds: z.array(z.string().regex(UUID_PATTERN, "Choose crew from the list.")).max(20, "At most 20 crew on one project.").optional(),
});

export type ProjectDetailsInput = z.infer<typeof projectDetailsSchema>;
