import { NextResponse } from "next/server";
import { parseJson, route } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { restartCycle } from "@/db/queries/cycle-restart";
import { restartCycleSchema } from "./restart.schema";

/** The lead restarts the cycle on purpose; it is recorded on the timeline with the reason. */
export const POST = route<{ id: string }>(async (req, { params }) => {
  const { id } = await params;
  const input = await parseJson(req, restartCycleSchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "override_gate" });
  return NextResponse.json(await restartCycle(project.id, input, user.id));
});
