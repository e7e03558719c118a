import { NextResponse } from "next/server";
import { projectRoute } from "@/server/route";
import { chooseProjectKit, getProjectKits } from "@/db/queries/test-kits";
import { kitChoiceSchema } from "./kit-choice.schema";

/** The kit each analyte is read with on this project. */
export const GET = projectRoute({ action: "log_water_test" }, async ({ project }) => NextResponse.json({ kits: await getProjectKits(project.id) }));

/** Chooses the kit for one analyte (the lead, as a project detail). */
export const PUT = projectRoute({ action: "edit_details", schema: kitChoiceSchema }, async ({ input, project, user }) =>
  NextResponse.json({ kits: await chooseProjectKit(project.id, input.analyte, input.kitId, user.id) }),
);
