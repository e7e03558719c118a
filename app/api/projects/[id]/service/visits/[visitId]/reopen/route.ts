import { NextResponse } from "next/server";
import { parseId, projectRoute } from "@/server/route";
import { reopenVisitReport } from "@/db/queries/visit-reports";
import { reopenSchema } from "../../../service.schema";
import { signerOf } from "../../../signer";

/** The lead reopens a signed-off report, with a reason kept on it. */
export const POST = projectRoute<typeof reopenSchema, undefined, { id: string; visitId: string }>(
  { action: "manage_service", schema: reopenSchema },
  async ({ input, project, relation, user, params }) => {
    const result = await reopenVisitReport({ projectId: project.id, visitId: parseId(params.visitId, "That visit"), who: signerOf(relation), userId: user.id, reason: input.reason });
    return NextResponse.json(result);
  },
);
