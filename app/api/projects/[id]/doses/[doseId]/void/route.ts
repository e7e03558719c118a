import { NextResponse } from "next/server";
import { parseId, projectRoute } from "@/server/route";
import { voidDose } from "@/db/queries/water";
import { voidSchema } from "@/app/api/projects/[id]/water-tests/water-test.schema";

/** The lead marks a dose as logged in error (the same lead-only permission as voiding a reading). */
export const POST = projectRoute<typeof voidSchema, undefined, { id: string; doseId: string }>(
  { action: "void_water_test", schema: voidSchema },
  async ({ input, project, user, params }) => {
    const dose = await voidDose(project.id, parseId(params.doseId, "That dose"), user.id, input.reason);
    return NextResponse.json({ dose });
  },
);
