import "server-only";
import { NextResponse } from "next/server";
import { parseJson, type RouteContext } from "@/server/route";
import { requireUser } from "@/server/session";
import { conflict } from "@/server/errors";
import { requireProject } from "@/db/queries/project-access";
import { getLatestApproval, revokeLoadApproval } from "@/db/queries/survey-design";
import { revokeLoadSchema } from "./load-approval.schema";

/** Shared by DELETE on the approval and POST …/revoke: marks it revoked, by whom and why. */
export async function revokeApproval(req: Request, ctx: RouteContext<{ id: string }>) {
  const { id } = await ctx.params;
  const input = await parseJson(req, revokeLoadSchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "approve_load" });
  const count = await revokeLoadApproval({ projectId: project.id, userId: user.id, reason: input.reason });
  if (count === 0) throw conflict("There is no standing approval to withdraw.");
  return NextResponse.json({ approval: await getLatestApproval(project.id) });
}
