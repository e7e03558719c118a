import { publicRoute } from "@/server/route";
import { notFound } from "@/server/errors";
import { calendarData, userByCalendarToken } from "@/db/queries/visits";
import { buildCalendar } from "@/lib/portal/calendar";
import { env } from "@/env";

/**
 * A person's calendar feed, read by calendar apps that carry no session: the secret in the address
 * is the key. Regenerating it on the account page revokes the old address.
 */
export const GET = publicRoute<undefined, undefined, { token: string }>({}, async ({ params }) => {
  const secret = params.token.replace(/\.ics$/i, "");
  if (!/^[A-Za-z0-9_-]{20,100}$/.test(secret)) throw notFound("That calendar");
  const user = await userByCalendarToken(secret);
  if (!user) throw notFound("That calendar");
  const data = await calendarData({ user });
  const body = buildCalendar({ ...data, appUrl: env().APP_URL, calendarName: "Aquarium projects" });
  return new Response(body, { headers: { "content-type": "text/calendar; charset=utf-8", "cache-control": "private, no-store" } });
});
