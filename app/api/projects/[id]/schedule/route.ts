import { NextResponse } from "next/server";
import { route, parseJson } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { getSchedule, saveSchedule } from "@/db/queries/money-settings";
import { scheduleSchema } from "./schedule.schema";

type Params = { id: string };

export const GET = route<Params>(async (_req, ctx) => {
  const { id } = await ctx.params;
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "manage_money" });
  return NextResponse.json({ schedule: await getSchedule(project.id) });
});

/** Sets this project's shares and monthly plan; instalments already billed keep their amounts. */
export const PUT = route<Params>(async (req, ctx) => {
  const { id } = await ctx.params;
  const input = await parseJson(req, scheduleSchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "manage_money" });
  return NextResponse.json({ schedule: await saveSchedule(project.id, input) });
});
