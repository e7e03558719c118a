import { NextResponse } from "next/server";
import { parseId, projectRoute } from "@/server/route";
import { updateVisit } from "@/db/queries/visits";
import { visitSchema } from "../visit.schema";

/** The lead changes a visit; moving the install day moves the project's target install date. */
export const PATCH = projectRoute<typeof visitSchema, undefined, { id: string; visitId: string }>(
  { action: "edit_details", schema: visitSchema },
  async ({ input, project, params }) => {
    const visit = await updateVisit({
      projectId: project.id,
      visitId: parseId(params.visitId, "That visit"),
      kind: input.kind,
      startsAt: input.startsAt,
      durationMinutes: input.durationMinutes,
      notes: input.notes || null,
    });
    return NextResponse.json({ visit });
  },
);
