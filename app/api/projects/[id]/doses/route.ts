import { NextResponse } from "next/server";
import { projectRoute } from "@/server/route";
import { badRequest } from "@/server/errors";
import { addDose, listDoses } from "@/db/queries/water";
import { doseSchema } from "./dose.schema";
import { READING_LIMITS } from "@/lib/cycling/readings";

export const GET = projectRoute({ action: "log_dose" }, async ({ project }) => NextResponse.json({ doses: await listDoses(project.id) }));

/** Logs an ammonia dose given during a fishless cycle (crew or lead). */
export const POST = projectRoute({ action: "log_dose", schema: doseSchema }, async ({ input, project, user }) => {
  if (input.dosedAt.getTime() > Date.now() + READING_LIMITS.futureToleranceMinutes * 60_000) {
    throw badRequest("Some fields need attention.", { dosedAt: "The dose time is in the future; check the date and time." });
  }
  const dose = await addDose(project.id, user.id, input);
  return NextResponse.json({ dose }, { status: 201 });
});
