import { NextResponse } from "next/server";
import { projectRoute } from "@/server/route";
import { getProjectDetail, updateProjectDetails } from "@/db/queries/project-create";
import { projectDetailsSchema } from "./project-details.schema";

/** One card's details for the board (lead and assigned crew; a client is sent to Your tanks). */
export const GET = projectRoute({ action: "view_internal" }, async ({ project }) => NextResponse.json(await getProjectDetail(project.id)));

/** Changes a project's details (lead only), guarded by the card's version. */
export const PATCH = projectRoute({ action: "edit_details", schema: projectDetailsSchema }, async ({ input, project }) => {
  const updated = await updateProjectDetails(project.id, input);
  return NextResponse.json({ id: updated.id, version: updated.version, movedInstallVisits: updated.movedInstallVisits });
});
