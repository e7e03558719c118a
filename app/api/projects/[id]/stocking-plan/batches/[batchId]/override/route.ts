import { NextResponse } from "next/server";
import { parseId, parseJson, route } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { overrideQuarantine } from "@/db/queries/quarantine";
import { quarantineOverrideSchema } from "@/app/(app)/projects/[id]/fish/quarantine.schema";

/** The lead's written reason to release a batch before its quarantine period ends. */
export const POST = route<{ id: string; batchId: string }>(async (req, { params }) => {
  const { id, batchId } = await params;
  const input = await parseJson(req, quarantineOverrideSchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "override_quarantine" });
  const batch = await overrideQuarantine({ projectId: project.id, batchId: parseId(batchId, "That batch"), userId: user.id, reason: input.reason });
  return NextResponse.json({ batch });
});
