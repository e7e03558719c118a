import { NextResponse } from "next/server";
import { parseId, projectRoute } from "@/server/route";
import { voidWaterTest } from "@/db/queries/water";
import { voidSchema } from "../../water-test.schema";

/** The lead marks a reading as entered in error; it stays on record with the reason. */
export const POST = projectRoute<typeof voidSchema, undefined, { id: string; testId: string }>(
  { action: "void_water_test", schema: voidSchema },
  async ({ input, project, user, params }) => {
    const test = await voidWaterTest(project.id, parseId(params.testId, "That water test"), user.id, input.reason);
    return NextResponse.json({ test });
  },
);
