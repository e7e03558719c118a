import { z } from "zod";
import { DATE_PATTERN, UUID_PATTERN } from "@/lib/stages/ids";

const dateOrEmpty = z.string().refine((v) => v === "" || (DATE_PATTERN.test(v) && !Number.isNaN(Date.parse(v))), "Enter a date, or leave it empty.");

/** A change to a project's details; only the fields sent are changed. `version` guards against overwriting someone else's change. */
export const projectDetailsSchema = z.object({
  version: z.number({ message: "The card's version is missing; reload and try again." }).int().min(1),
  title: z.string().trim().min(2, "Give the project a title.").max(120, "Keep the title under 120 characters.").optional(),
  siteAddress: z.string().trim().min(3, "Enter the site's street address.").max(200, "Keep the address under 200 characters.").optional(),
  siteTown: z.string().trim().min(2, "Enter the site's town.").max(80, "Keep the town under 80 characters.").optional(),
  targetInstallDate: dateOrEmpty.optional(),
  targetHandoverDate: dateOrEmpty.optional(),
  tankSummary: z.string().trim().max(200, "Keep the tank summary under 200 characters.").optional(),
  crewIds: z.array(z.string().regex(UUID_PATTERN, "Choose crew from the list.")).max(20, "At most 20 crew on one project.").optional(),
});

export type ProjectDetailsInput = z.infer<typeof projectDetailsSchema>;
