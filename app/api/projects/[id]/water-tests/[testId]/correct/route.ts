import { NextResponse } from "next/server";
import { parseId, projectRoute } from "@/server/route";
import { correctWaterTest, getUnitSystem } from "@/db/queries/water";
import { correctWaterTestSchema } from "../../water-test.schema";
import { readingFromInput } from "../../reading-input";

/** The lead corrects a reading: a new row replaces it, and the old one is voided with the reason. */
export const POST = projectRoute<typeof correctWaterTestSchema, undefined, { id: string; testId: string }>(
  { action: "void_water_test", schema: correctWaterTestSchema },
  async ({ input, project, user, params }) => {
    const now = new Date();
    const values = readingFromInput(input, await getUnitSystem(user.id), now);
    const result = await correctWaterTest(project.id, parseId(params.testId, "That water test"), user.id, values, input.reason, now);
    return NextResponse.json(result, { status: 201 });
  },
);
