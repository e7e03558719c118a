import { NextResponse } from "next/server";
import { projectRoute } from "@/server/route";
import { addWaterTest, getUnitSystem, listWaterTests } from "@/db/queries/water";
import { waterTestSchema } from "./water-test.schema";
import { readingFromInput } from "./reading-input";

/** The project's readings, newest first, voided ones included and marked. */
export const GET = projectRoute({ action: "view" }, async ({ project }) => NextResponse.json({ tests: await listWaterTests(project.id) }));

/** Logs a water test taken by the signed-in person (crew, the lead, or the project's client). */
export const POST = projectRoute({ action: "log_water_test", schema: waterTestSchema }, async ({ input, project, user }) => {
  const now = new Date();
  const values = readingFromInput(input, await getUnitSystem(user.id), now);
  const { test, notified } = await addWaterTest(project.id, user.id, values, now);
  return NextResponse.json({ test, cycleReadyNotified: notified }, { status: 201 });
});
