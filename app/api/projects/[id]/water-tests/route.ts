import { NextResponse } from "next/server";
import { route, parseJson } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { addWaterTest, getUnitSystem, listWaterTests } from "@/db/queries/water";
import { waterTestSchema } from "@/app/(app)/projects/[id]/water/water-test.schema";
import { readingFromInput } from "./reading-input";

type Params = { id: string };

/** The project's readings, newest first, voided ones included and marked. */
export const GET = route<Params>(async (_req, ctx) => {
  const { id } = await ctx.params;
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "view" });
  return NextResponse.json({ tests: await listWaterTests(project.id, { includeVoided: user.role !== "client" }) });
});

/** Logs a water test taken by the signed-in person (crew, the lead, or the project's client). */
export const POST = route<Params>(async (req, ctx) => {
  const { id } = await ctx.params;
  const input = await parseJson(req, waterTestSchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "log_water_test" });
  const now = new Date();
  const values = readingFromInput(input, await getUnitSystem(user.id), now);
  const { test, notified } = await addWaterTest(project.id, user.id, values, now);
  return NextResponse.json({ test, cycleReadyNotified: notified }, { status: 201 });
});
