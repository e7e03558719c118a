import { NextResponse } from "next/server";
import { userRoute } from "@/server/route";
import { getPrefs, setPrefs } from "@/db/queries/notification-prefs";
import { prefsSchema } from "./prefs.schema";

export const GET = userRoute({}, async ({ user }) => NextResponse.json({ prefs: await getPrefs(user.id) }));

/** Turns kinds of e-mail on or off for the caller; kinds left out keep their setting. */
export const PUT = userRoute({ schema: prefsSchema }, async ({ input, user }) => {
  await setPrefs(user.id, input);
  return NextResponse.json({ prefs: await getPrefs(user.id) });
});
