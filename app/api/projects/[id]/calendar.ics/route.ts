import { projectRoute } from "@/server/route";
import { calendarData } from "@/db/queries/visits";
import { buildCalendar } from "@/lib/portal/calendar";
import { env } from "@/env";

/** The project's install date and visits as a calendar file, for anyone who can see the project. */
export const GET = projectRoute({ action: "view" }, async ({ project, user }) => {
  const data = await calendarData({ projectId: project.id, user });
  const body = buildCalendar({ ...data, appUrl: env().APP_URL, calendarName: project.title });
  return new Response(body, {
    headers: { "content-type": "text/calendar; charset=utf-8", "content-disposition": `attachment; filename="project-${project.id.slice(0, 8)}.ics"`, "cache-control": "private, no-store" },
  });
});
