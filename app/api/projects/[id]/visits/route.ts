import { NextResponse } from "next/server";
import { projectRoute } from "@/server/route";
import { addVisit, listVisits } from "@/db/queries/visits";
import { visitSchema } from "./visit.schema";

export const GET = projectRoute({ action: "view" }, async ({ project }) => NextResponse.json({ visits: await listVisits(project.id) }));

/** The lead books the install day and later visits; everyone on the project sees them. */
export const POST = projectRoute({ action: "edit_details", schema: visitSchema }, async ({ input, project, user }) => {
  const visit = await addVisit({ projectId: project.id, kind: input.kind, startsAt: input.startsAt, durationMinutes: input.durationMinutes, notes: input.notes || null, by: user.id });
  return NextResponse.json({ visit }, { status: 201 });
});
