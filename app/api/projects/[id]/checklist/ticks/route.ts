import { NextResponse } from "next/server";
import { projectRoute, requireAction } from "@/server/route";
import { recordTick } from "@/db/queries/checklists";
import { tickSchema } from "../tick.schema";

/**
 * Ticks (done = true) or unticks (done = false, lead only, with a reason) an item. The same
 * clientKey sent again answers 200 with the stored tick and adds nothing.
 */
export const POST = projectRoute({ action: "tick_checklist", schema: tickSchema }, async ({ input, project, relation, user }) => {
  if (!input.done) requireAction(relation, "untick_checklist", "Only the lead can untick an item.");
  const { tick, replayed } = await recordTick(project.id, user.id, input);
  return NextResponse.json({ tick, replayed }, { status: replayed ? 200 : 201 });
});
