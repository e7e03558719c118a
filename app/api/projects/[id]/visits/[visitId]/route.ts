import { NextResponse } from "next/server";
import { parseId, parseJson, route } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { updateVisit } from "@/db/queries/visits";
import { visitSchema } from "../visit.schema";

/** The lead changes a visit; moving the install day moves the project's target install date. */
export const PATCH = route<{ id: string; visitId: string }>(async (req, { params }) => {
  const { id, visitId } = await params;
  const input = await parseJson(req, visitSchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "edit_details" });
  const visit = await updateVisit({
    projectId: project.id,
    visitId: parseId(visitId, "That visit"),
    kind: input.kind,
    startsAt: input.startsAt,
    durationMinutes: input.durationMinutes,
    notes: input.notes || null,
  });
  return NextResponse.json({ visit });
});
