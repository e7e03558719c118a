import { NextResponse } from "next/server";
import { parseId, projectRoute } from "@/server/route";
import { cancelVisit } from "@/db/queries/visits";
import { cancelVisitSchema } from "../../visit.schema";

/** The lead cancels a visit with a reason; it leaves the calendars but stays on record. */
export const POST = projectRoute<typeof cancelVisitSchema, undefined, { id: string; visitId: string }>(
  { action: "edit_details", schema: cancelVisitSchema },
  async ({ input, project, user, params }) => {
    const visit = await cancelVisit({ projectId: project.id, visitId: parseId(params.visitId, "That visit"), by: user.id, reason: input.reason });
    return NextResponse.json({ visit });
  },
);
