import { NextResponse } from "next/server";
import { route, parseJson } from "@/server/route";
import { requireUser } from "@/server/session";
import { forbidden } from "@/server/errors";
import { requireProject } from "@/db/queries/project-access";
import { getProjectDetail, updateProjectDetails } from "@/db/queries/project-create";
import { projectDetailsSchema } from "./project-details.schema";

type Params = { id: string };

/** One card's details for the board (lead and assigned crew). */
export const GET = route<Params>(async (_req, { params }) => {
  const { id } = await params;
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "view" });
  if (user.role === "client") throw forbidden("The board is for the install team; your tanks are under Your tanks.");
  return NextResponse.json(await getProjectDetail(project.id));
});

/** Changes a project's details (lead only), guarded by the card's version. */
export const PATCH = route<Params>(async (req, { params }) => {
  const { id } = await params;
  const input = await parseJson(req, projectDetailsSchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "edit_details" });
  const updated = await updateProjectDetails(project.id, input);
  return NextResponse.json({ id: updated.id, version: updated.version });
});
