import { NextResponse } from "next/server";
import { projectRoute, requireAction } from "@/server/route";
import { recordTick } from "@/db/queries/checklists";
import { latestTick } from "@/db/queries/checklists";
import { canOnProject } from "@/lib/auth/permissions";
import { canUndoOwn, UNDO_WINDOW_MINUTES } from "@/lib/install/undo-window";
import { forbidden } from "@/server/errors";
import { tickSchema } from "../tick.schema";

/**
 * Ticks (done = true) or unticks (done = false, lead only, with a reason) an item. Crew may untick
 * their own tick within the undo window (a mis-tap). The same clientKey sent again answers 200 with
 * the stored tick and adds nothing.
 */
export const POST = projectRoute({ action: "tick_checklist", schema: tickSchema }, async ({ input, project, relation, user }) => {
  // Crew may undo their own tick inside the undo window; any other untick is the lead's.
  if (!input.done && !canOnProject(relation, "untick_checklist")) {
    const last = await latestTick(project.id, input.itemId);
    if (!last || !last.done || !canUndoOwn({ byUserId: last.byUserId, at: last.at }, user.id, new Date())) {
      throw forbidden(`You can undo your own tick within ${UNDO_WINDOW_MINUTES} minutes; after that, ask the lead to untick it.`);
    }
    input.note = input.note?.trim() || "Undone: ticked by mistake";
  }
  const { tick, replayed } = await recordTick(project.id, user.id, input);
  return NextResponse.json({ tick, replayed }, { status: replayed ? 200 : 201 });
});
