import { NextResponse } from "next/server";
import { route, parseJson, parseId } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { voidWaterTest } from "@/db/queries/water";
import { voidSchema } from "@/app/(app)/projects/[id]/water/water-test.schema";

/** The lead marks a reading as entered in error; it stays on record with the reason. */
export const POST = route<{ id: string; testId: string }>(async (req, ctx) => {
  const { id, testId } = await ctx.params;
  const input = await parseJson(req, voidSchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "void_water_test" });
  const test = await voidWaterTest(project.id, parseId(testId, "That water test"), user.id, input.reason);
  return NextResponse.json({ test });
});
