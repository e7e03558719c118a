import { NextResponse } from "next/server";
import { projectRoute } from "@/server/route";
import { canOnProject } from "@/lib/auth/permissions";
import { moveProject } from "@/db/queries/project-move";
import { moveSchema } from "./move.schema";

/** A card dropped on the board: 422 with reasons when a gate refuses, 409 when the card changed meanwhile. */
export const POST = projectRoute({ action: "move", schema: moveSchema }, async ({ input, project, relation, user }) => {
  const result = await moveProject(project.id, input, { id: user.id, canOverride: canOnProject(relation, "override_gate") });
  return NextResponse.json(result);
});
