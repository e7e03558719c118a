import { NextResponse } from "next/server";
import { userRoute } from "@/server/route";
import { regenerateCalendarToken } from "@/db/queries/visits";
import { env } from "@/env";

/** Creates or replaces the caller's calendar-feed address; the old one stops working. */
export const POST = userRoute({}, async ({ user }) => {
  const token = await regenerateCalendarToken(user.id);
  return NextResponse.json({ url: `${env().APP_URL}/api/calendar/${token}.ics` }, { status: 201 });
});
