import { NextResponse } from "next/server";
import { parseJson, route } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { recordTick } from "@/db/queries/checklists";
import { tickSchema } from "../tick.schema";

/**
 * Ticks (done = true) or unticks (done = false, lead only, with a reason) an item. The same
 * clientKey sent again answers 200 with the stored tick and adds nothing.
 */
export const POST = route<{ id: string }>(async (req, { params }) => {
  const input = await parseJson(req, tickSchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: (await params).id, user, action: input.done ? "tick_checklist" : "untick_checklist" });
  const { tick, replayed } = await recordTick(project.id, user.id, input);
  return NextResponse.json({ tick, replayed }, { status: replayed ? 200 : 201 });
});
