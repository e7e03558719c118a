import { NextResponse } from "next/server";
import { projectRoute } from "@/server/route";
import { listLeakChecks, recordLeakCheck } from "@/db/queries/leak-checks";
import { leakTestPassed } from "@/lib/install/leak-rules";
import { leakCheckSchema } from "./leak-check.schema";

export const GET = projectRoute({ action: "view_internal" }, async ({ project }) => {
  const checks = await listLeakChecks(project.id);
  return NextResponse.json({ checks, passed: leakTestPassed(checks) });
});

/** Records the fill, the check at fill, or the day-after check (not before 20 hours after the fill). */
export const POST = projectRoute({ action: "tick_checklist", schema: leakCheckSchema }, async ({ input, project, user }) => {
  const check = await recordLeakCheck(project.id, user.id, input);
  return NextResponse.json({ check }, { status: 201 });
});
