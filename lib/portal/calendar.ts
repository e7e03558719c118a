import { createEvents, type EventAttributes } from "ics";
import { parsePlainDate } from "./next-steps";

export type CalendarInput = {
  projects: { id: string; title: string; siteAddress: string; targetInstallDate: string | null }[];
  visits: { id: string; projectId: string; kind: string; startsAt: Date; durationMinutes: number; notes: string | null }[];
  appUrl: string;
  calendarName: string;
};

/**
 * An iCalendar file: each planned install date as an all-day event and every booked visit at its
 * time. UIDs are stable, so a calendar that re-reads the feed updates events instead of doubling them.
 */
export function buildCalendar(input: CalendarInput): string {
  const byId = new Map(input.projects.map((p) => [p.id, p]));
  const events: EventAttributes[] = [];
  for (const p of input.projects) {
    const day = parsePlainDate(p.targetInstallDate);
    if (!day) continue;
    const next = new Date(day.getTime() + 24 * 3600 * 1000);
    events.push({
      uid: `install-${p.id}@tankwright`,
      title: `Planned install: ${p.title}`,
      start: [day.getUTCFullYear(), day.getUTCMonth() + 1, day.getUTCDate()],
      end: [next.getUTCFullYear(), next.getUTCMonth() + 1, next.getUTCDate()],
      location: p.siteAddress,
      url: `${input.appUrl}/projects/${p.id}`,
      description: "Planned install date; the booked visit, when there is one, has the time.",
    });
  }
  for (const v of input.visits) {
    const p = byId.get(v.projectId);
    if (!p) continue;
    events.push({
      uid: `visit-${v.id}@tankwright`,
      title: `${capitalise(v.kind)}: ${p.title}`,
      start: v.startsAt.getTime(),
      startInputType: "utc",
      startOutputType: "utc",
      duration: { minutes: v.durationMinutes },
      location: p.siteAddress,
      url: `${input.appUrl}/projects/${p.id}`,
      description: v.notes ?? undefined,
    });
  }
  const { error, value } = createEvents(events, { calName: input.calendarName, productId: "tankwright/calendar" });
  if (error || !value) {
    // An empty calendar is still a valid file for subscribers.
    if (!events.length) return emptyCalendar(input.calendarName);
    throw error ?? new Error("The calendar could not be built.");
  }
  return value;
}

function emptyCalendar(name: string): string {
  return ["BEGIN:VCALENDAR", "VERSION:2.0", "CALSCALE:GREGORIAN", "PRODID:tankwright/calendar", "METHOD:PUBLISH", `X-WR-CALNAME:${name.replace(/[\r\n]/g, " ")}`, "END:VCALENDAR", ""].join("\r\n");
}

function capitalise(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}
