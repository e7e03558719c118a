import { NextResponse } from "next/server";
import { parseJson, route } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { addLivestockEvent } from "@/db/queries/livestock";
import { livestockEventSchema } from "@/app/(app)/projects/[id]/fish/livestock-event.schema";

/** One event on a group of fish (a loss, a move to holding and back, a measurement…); the lead or assigned crew. */
export const POST = route<{ id: string }>(async (req, { params }) => {
  const { id } = await params;
  const input = await parseJson(req, livestockEventSchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "record_livestock" });
  const { at, ...rest } = input;
  const result = await addLivestockEvent({ projectId: project.id, userId: user.id, values: { ...rest, at: at ?? new Date() } });
  return NextResponse.json(result, { status: 201 });
});
