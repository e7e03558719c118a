import { NextResponse } from "next/server";
import { route, parseJson, parseId } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { correctWaterTest, getUnitSystem } from "@/db/queries/water";
import { correctWaterTestSchema } from "@/app/(app)/projects/[id]/water/water-test.schema";
import { readingFromInput } from "../../reading-input";

/** The lead corrects a reading: a new row replaces it, and the old one is voided with the reason. */
export const POST = route<{ id: string; testId: string }>(async (req, ctx) => {
  const { id, testId } = await ctx.params;
  const input = await parseJson(req, correctWaterTestSchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "void_water_test" });
  const now = new Date();
  const values = readingFromInput(input, await getUnitSystem(user.id), now);
  const result = await correctWaterTest(project.id, parseId(testId, "That water test"), user.id, values, input.reason, now);
  return NextResponse.json(result, { status: 201 });
});
