import { NextResponse } from "next/server";
import { route, parseJson } from "@/server/route";
import { requireUser } from "@/server/session";
import { badRequest } from "@/server/errors";
import { requireProject } from "@/db/queries/project-access";
import { addDose, listDoses } from "@/db/queries/water";
import { doseSchema } from "@/app/(app)/projects/[id]/water/dose.schema";
import { READING_LIMITS } from "@/lib/cycling/readings";

type Params = { id: string };

export const GET = route<Params>(async (_req, ctx) => {
  const { id } = await ctx.params;
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "log_dose" });
  return NextResponse.json({ doses: await listDoses(project.id) });
});

/** Logs an ammonia dose given during a fishless cycle (crew or lead). */
export const POST = route<Params>(async (req, ctx) => {
  const { id } = await ctx.params;
  const input = await parseJson(req, doseSchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "log_dose" });
  if (input.dosedAt.getTime() > Date.now() + READING_LIMITS.futureToleranceMinutes * 60_000) {
    throw badRequest("Some fields need attention.", { dosedAt: "The dose time is in the future; check the date and time." });
  }
  const dose = await addDose(project.id, user.id, input);
  return NextResponse.json({ dose }, { status: 201 });
});
