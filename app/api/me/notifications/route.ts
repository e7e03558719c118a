import { NextResponse } from "next/server";
import { parseJson, route } from "@/server/route";
import { requireUser } from "@/server/session";
import { getPrefs, setPrefs } from "@/db/queries/notification-prefs";
import { prefsSchema } from "./prefs.schema";

export const GET = route(async () => {
  const user = await requireUser();
  return NextResponse.json({ prefs: await getPrefs(user.id) });
});

/** Turns kinds of e-mail on or off for the caller; kinds left out keep their setting. */
export const PUT = route(async (req) => {
  const input = await parseJson(req, prefsSchema);
  const user = await requireUser();
  await setPrefs(user.id, input);
  return NextResponse.json({ prefs: await getPrefs(user.id) });
});
