import { z } from "zod";
import { text } from "@/lib/validation/text";

/** The company's routine-visit tasks in order; a plan copies them when it is made. */
export const serviceTasksSchema = z
  .object({
    tasks: z.array(text(200, "Keep each task under 200 characters.").min(1, "A task needs a few words."), { message: "List the tasks." }).max(40, "Keep the template to 40 tasks or fewer."),
  })
  .refine((v) => new Set(v.tasks).size === v.tasks.length, { message: "Each task appears once.", path: ["tasks"] });
