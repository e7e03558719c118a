import { NextResponse } from "next/server";
import { parseId, projectRoute } from "@/server/route";
import { getWaterTest, voidWaterTest } from "@/db/queries/water";
import { forbidden, notFound } from "@/server/errors";
import { canUndoOwn, UNDO_WINDOW_MINUTES } from "@/lib/install/undo-window";

/**
 * The person who logged a water test takes it back within the undo window (a mis-tap): it is
 * voided in their name, so it stays on record but no longer counts.
 */
export const POST = projectRoute<undefined, undefined, { id: string; testId: string }>({ action: "log_water_test" }, async ({ project, user, params }) => {
  const test = await getWaterTest(project.id, parseId(params.testId, "That water test"));
  if (!test || test.voidedAt) throw notFound("That water test");
  if (!canUndoOwn({ byUserId: test.takenBy, at: test.createdAt }, user.id, new Date())) {
    throw forbidden(`You can take back your own water test within ${UNDO_WINDOW_MINUTES} minutes of logging it; after that, ask the lead to void it.`);
  }
  const voided = await voidWaterTest(project.id, test.id, user.id, `Taken back by ${user.name} just after logging it`);
  return NextResponse.json({ test: voided });
});
