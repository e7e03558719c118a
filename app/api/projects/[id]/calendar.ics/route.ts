import { route } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { calendarData } from "@/db/queries/visits";
import { buildCalendar } from "@/lib/portal/calendar";
import { env } from "@/env";

type Params = { id: string };

/** The project's install date and visits as a calendar file, for anyone who can see the project. */
export const GET = route<Params>(async (_req, { params }) => {
  const { id } = await params;
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "view" });
  const data = await calendarData({ projectId: project.id, user });
  const body = buildCalendar({ ...data, appUrl: env().APP_URL, calendarName: project.title });
  return new Response(body, {
    headers: { "content-type": "text/calendar; charset=utf-8", "content-disposition": `attachment; filename="project-${project.id.slice(0, 8)}.ics"`, "cache-control": "private, no-store" },
  });
});
