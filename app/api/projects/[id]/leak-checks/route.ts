import { NextResponse } from "next/server";
import { parseJson, route } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { listLeakChecks, recordLeakCheck } from "@/db/queries/leak-checks";
import { leakTestPassed } from "@/lib/install/leak-rules";
import { leakCheckSchema } from "./leak-check.schema";

export const GET = route<{ id: string }>(async (_req, { params }) => {
  const user = await requireUser("lead", "crew");
  const { project } = await requireProject({ projectId: (await params).id, user, action: "tick_checklist" });
  const checks = await listLeakChecks(project.id);
  return NextResponse.json({ checks, passed: leakTestPassed(checks) });
});

/** Records the fill, the check at fill, or the day-after check (not before 20 hours after the fill). */
export const POST = route<{ id: string }>(async (req, { params }) => {
  const input = await parseJson(req, leakCheckSchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: (await params).id, user, action: "tick_checklist" });
  const check = await recordLeakCheck(project.id, user.id, input);
  return NextResponse.json({ check }, { status: 201 });
});
