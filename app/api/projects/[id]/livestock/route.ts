import { NextResponse } from "next/server";
import { route } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { getLivestock } from "@/db/queries/livestock";

/** The tank's fish: groups, census, growth and history. Everyone on the project may read it. */
export const GET = route<{ id: string }>(async (_req, { params }) => {
  const { id } = await params;
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "view_livestock" });
  return NextResponse.json(await getLivestock(project.id));
});
