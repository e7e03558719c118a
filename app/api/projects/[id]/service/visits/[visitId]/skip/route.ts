import { NextResponse } from "next/server";
import { parseId, projectRoute } from "@/server/route";
import { skipServiceVisit } from "@/db/queries/service-plans";
import { skipVisitSchema } from "../../../service.schema";

/** The lead skips one visit with a reason; the plan never brings it back. */
export const POST = projectRoute<typeof skipVisitSchema, undefined, { id: string; visitId: string }>(
  { action: "manage_service", schema: skipVisitSchema },
  async ({ input, project, user, params }) => {
    const visit = await skipServiceVisit({ projectId: project.id, visitId: parseId(params.visitId, "That visit"), by: user.id, reason: input.reason });
    return NextResponse.json({ visit });
  },
);
