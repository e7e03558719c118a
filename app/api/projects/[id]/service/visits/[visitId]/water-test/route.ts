import { NextResponse } from "next/server";
import { parseId, projectRoute } from "@/server/route";
import { recordVisitWaterTest } from "@/db/queries/visit-reports";
import { getUnitSystem } from "@/db/queries/water";
import { waterTestSchema } from "../../../../water-tests/water-test.schema";
import { readingFromInput } from "../../../../water-tests/reading-input";
import { signerOf } from "../../../signer";

/** The visit's water test, kept in the project's water-test record (same checks) and shown on the report. */
export const POST = projectRoute<typeof waterTestSchema, undefined, { id: string; visitId: string }>(
  { action: "record_visit", schema: waterTestSchema },
  async ({ input, project, relation, user, params }) => {
    const values = readingFromInput(input, await getUnitSystem(user.id), new Date());
    const test = await recordVisitWaterTest({ projectId: project.id, visitId: parseId(params.visitId, "That visit"), who: signerOf(relation), userId: user.id, values });
    return NextResponse.json({ test }, { status: 201 });
  },
);
