import { NextResponse } from "next/server";
import { parseId, projectRoute } from "@/server/route";
import { moveServiceVisit } from "@/db/queries/service-plans";
import { moveVisitSchema } from "../../../service.schema";

/** The lead moves one visit (time or person); the series keeps it where it was put. */
export const POST = projectRoute<typeof moveVisitSchema, undefined, { id: string; visitId: string }>(
  { action: "manage_service", schema: moveVisitSchema },
  async ({ input, project, params }) => {
    const visit = await moveServiceVisit({ projectId: project.id, visitId: parseId(params.visitId, "That visit"), startsAt: input.startsAt, assignedTo: input.assignedTo });
    return NextResponse.json({ visit });
  },
);
