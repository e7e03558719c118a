import { NextResponse } from "next/server";
import { parseJson, route } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { addVisit, listVisits } from "@/db/queries/visits";
import { visitSchema } from "./visit.schema";

type Params = { id: string };

export const GET = route<Params>(async (_req, { params }) => {
  const { id } = await params;
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "view" });
  return NextResponse.json({ visits: await listVisits(project.id) });
});

/** The lead books the install day and later visits; everyone on the project sees them. */
export const POST = route<Params>(async (req, { params }) => {
  const { id } = await params;
  const input = await parseJson(req, visitSchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "edit_details" });
  const visit = await addVisit({ projectId: project.id, kind: input.kind, startsAt: input.startsAt, durationMinutes: input.durationMinutes, notes: input.notes || null, by: user.id });
  return NextResponse.json({ visit }, { status: 201 });
});
