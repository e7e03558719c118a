import { NextResponse } from "next/server";
import { projectRoute } from "@/server/route";
import { restartCycle } from "@/db/queries/cycle-restart";
import { restartCycleSchema } from "./restart.schema";

/** The lead restarts the cycle on purpose; it is recorded on the timeline with the reason. */
export const POST = projectRoute({ action: "override_gate", schema: restartCycleSchema }, async ({ input, project, user }) =>
  NextResponse.json(await restartCycle(project.id, input, user.id)),
);
