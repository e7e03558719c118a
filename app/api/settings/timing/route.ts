import { NextResponse } from "next/server";
import { route, parseJson } from "@/server/route";
import { requireUser } from "@/server/session";
import { db } from "@/db";
import { getStageDurations, saveTimingSettings } from "@/db/queries/stage-durations";
import { noticeDelaySeconds } from "@/db/queries/outbox";
import { timingSchema } from "@/app/(app)/settings/timing.schema";

/** Expected stage durations in force and the e-mail hold. Lead only. */
export const GET = route(async () => {
  await requireUser("lead");
  return NextResponse.json({ stageDurations: await getStageDurations(), noticeDelaySeconds: await noticeDelaySeconds(db()) });
});

/** Replaces the company's timing settings; an empty field goes back to the default. */
export const PUT = route(async (req) => {
  const input = await parseJson(req, timingSchema);
  await requireUser("lead");
  const durations = Object.fromEntries(Object.entries(input.stageDurations).map(([k, v]) => [k, v ?? null]));
  const minutes = input.noticeDelayMinutes ?? null;
  await saveTimingSettings({ stageDurations: durations, noticeDelaySeconds: minutes === null ? null : Math.round(minutes * 60) });
  return NextResponse.json({ stageDurations: await getStageDurations(), noticeDelaySeconds: await noticeDelaySeconds(db()) });
});
