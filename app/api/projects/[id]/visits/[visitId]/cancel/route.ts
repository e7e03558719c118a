import { NextResponse } from "next/server";
import { parseId, parseJson, route } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { cancelVisit } from "@/db/queries/visits";
import { cancelVisitSchema } from "../../visit.schema";

/** The lead cancels a visit with a reason; it leaves the calendars but stays on record. */
export const POST = route<{ id: string; visitId: string }>(async (req, { params }) => {
  const { id, visitId } = await params;
  const input = await parseJson(req, cancelVisitSchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "edit_details" });
  const visit = await cancelVisit({ projectId: project.id, visitId: parseId(visitId, "That visit"), by: user.id, reason: input.reason });
  return NextResponse.json({ visit });
});
