import { NextResponse } from "next/server";
import { userRoute } from "@/server/route";
import { db } from "@/db";
import { getStageDurations, saveTimingSettings } from "@/db/queries/stage-durations";
import { noticeDelaySeconds } from "@/db/queries/outbox";
import { timingSchema } from "./timing.schema";

/** Expected stage durations in force and the e-mail hold. Lead only. */
export const GET = userRoute({ roles: ["lead"] }, async () =>
  NextResponse.json({ stageDurations: await getStageDurations(), noticeDelaySeconds: await noticeDelaySeconds(db()) }),
);

/** Replaces the company's timing settings; an empty field goes back to the default. */
export const PUT = userRoute({ roles: ["lead"], schema: timingSchema }, async ({ input }) => {
  const durations = Object.fromEntries(Object.entries(input.stageDurations).map(([k, v]) => [k, v ?? null]));
  const minutes = input.noticeDelayMinutes ?? null;
  await saveTimingSettings({ stageDurations: durations, noticeDelaySeconds: minutes === null ? null : Math.round(minutes * 60) });
  return NextResponse.json({ stageDurations: await getStageDurations(), noticeDelaySeconds: await noticeDelaySeconds(db()) });
});
