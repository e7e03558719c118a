import { z } from "zod";
import { UUID_PATTERN } from "@/lib/stages/ids";
import { dateOnlyOrEmpty, text } from "@/lib/validation/text";

const id = (message: string) => z.string().regex(UUID_PATTERN, message);
const optionalDate = dateOnlyOrEmpty();

/** A new project, from the lead's form; the client is an existing account or a new one to invite. */
export const projectCreateSchema = z
  .object({
    clientMode: z.enum(["existing", "new"], { message: "Choose an existing client or add a new one." }),
    clientId: text(40),
    clientName: text(120, "Keep the name under 120 characters."),
    clientEmail: text(200, "Keep the e-mail under 200 characters."),
    title: text(120, "Keep the title under 120 characters.").min(2, "Give the project a title."),
    siteAddress: text(200, "Keep the address under 200 characters.").min(3, "Enter the site's street address."),
    siteTown: text(80, "Keep the town under 80 characters.").min(2, "Enter the site's town."),
    targetInstallDate: optionalDate,
    leadId: text(40).refine((v) => v === "" || UUID_PATTERN.test(v), "Choose a lead from the list."),
    crewIds: z.array(id("Choose crew from the list.")).max(20, "At most 20 crew on one project."),
    tankSummary: text(200, "Keep the tank summary under 200 characters."),
  })
  .superRefine((v, ctx) => {
    if (v.clientMode === "existing" && !UUID_PATTERN.test(v.clientId)) ctx.addIssue({ code: "custom", path: ["clientId"], message: "Choose the client." });
    if (v.clientMode === "new") {
      if (v.clientName.length < 2) ctx.addIssue({ code: "custom", path: ["clientName"], message: "Enter the client's name." });
      if (!z.email().safeParse(v.clientEmail).success) ctx.addIssue({ code: "custom", path: ["clientEmail"], message: "Enter the client's e-mail address." });
    }
  });

export type ProjectCreateInput = z.infer<typeof projectCreateSchema>;
