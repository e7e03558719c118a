import "server-only";
import { NextResponse } from "next/server";
import { projectRoute } from "@/server/route";
import { conflict } from "@/server/errors";
import { getLatestApproval, revokeLoadApproval } from "@/db/queries/survey-design";
import { revokeLoadSchema } from "./load-approval.schema";

/** Shared by DELETE on the approval and POST …/revoke: marks it revoked, by whom and why. */
export const revokeApproval = projectRoute({ action: "approve_load", schema: revokeLoadSchema }, async ({ input, project, user }) => {
  const count = await revokeLoadApproval({ projectId: project.id, userId: user.id, reason: input.reason });
  if (count === 0) throw conflict("There is no standing approval to withdraw.");
  return NextResponse.json({ approval: await getLatestApproval(project.id) });
});
