import { NextResponse } from "next/server";
import { projectRoute } from "@/server/route";
import { getSchedule, saveSchedule } from "@/db/queries/money-settings";
import { scheduleSchema } from "./schedule.schema";

export const GET = projectRoute({ action: "manage_money" }, async ({ project }) => {
  return NextResponse.json({ schedule: await getSchedule(project.id) });
});

/** Sets this project's shares and monthly plan; instalments already billed keep their amounts. */
export const PUT = projectRoute({ action: "manage_money", schema: scheduleSchema }, async ({ input, project }) => {
  return NextResponse.json({ schedule: await saveSchedule(project.id, input) });
});
