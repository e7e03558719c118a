import { describe, expect, it } from "vitest";
import { checklistMilestones, clientTimeline, type TimelineEntry } from "@/lib/portal/timeline";
import { buildCalendar } from "@/lib/portal/calendar";

const at = (h: number) => new Date(Date.UTC(2026, 10, 1, h));

describe("checklistMilestones", () => {
  const items = [
    { id: "a", stage: "aquascape" as const },
    { id: "b", stage: "aquascape" as const },
    { id: "c", stage: "fill_leak_test" as const },
  ];

  it("marks a stage when all its items are done at once, counting unticks", () => {
    const ticks = [
      { itemId: "a", done: true, at: at(1), seq: 1 },
      { itemId: "a", done: false, at: at(2), seq: 2 },
      { itemId: "b", done: true, at: at(3), seq: 3 },
      { itemId: "a", done: true, at: at(4), seq: 4 },
    ];
    expect(checklistMilestones(items, ticks)).toEqual([{ stage: "aquascape", at: at(4) }]);
  });

  it("replays ticks in their order, not the order given, and ignores unknown items", () => {
    const ticks = [
      { itemId: "c", done: true, at: at(5), seq: 9 },
      { itemId: "zz", done: true, at: at(1), seq: 1 },
      { itemId: "c", done: false, at: at(4), seq: 8 },
    ];
    expect(checklistMilestones(items, ticks)).toEqual([{ stage: "fill_leak_test", at: at(5) }]);
    expect(checklistMilestones(items, [])).toEqual([]);
  });
});

describe("clientTimeline", () => {
  it("drops internal notes and sorts newest first", () => {
    const entries: TimelineEntry[] = [
      { kind: "note", id: "n1", at: at(1), body: "internal", byName: "Lead", shared: false },
      { kind: "note", id: "n2", at: at(3), body: "shared", byName: "Lead", shared: true },
      { kind: "stage", id: "s1", at: at(2), fromStage: "site_survey", toStage: "stand_load_check", override: true, reason: "Because", byName: "Lead" },
    ];
    expect(clientTimeline(entries).map((e) => e.id)).toEqual(["n2", "s1"]);
  });
});

describe("buildCalendar", () => {
  it("lists install dates as all-day events and visits at their UTC time, with stable ids", () => {
    const ics = buildCalendar({
      projects: [{ id: "p1", title: "Lounge reef", siteAddress: "2 Fixture Lane", targetInstallDate: "2027-01-13" }],
      visits: [{ id: "v1", projectId: "p1", kind: "leak check", startsAt: new Date("2027-01-14T09:30:00Z"), durationMinutes: 60, notes: null }],
      appUrl: "http://app.test",
      calendarName: "Projects",
    });
    expect(ics).toContain("BEGIN:VCALENDAR");
    expect(ics).toContain("UID:install-p1@tankwright");
    expect(ics).toContain("DTSTART;VALUE=DATE:20270113");
    expect(ics).toContain("DTSTART:20270114T093000Z");
    expect(ics).toContain("SUMMARY:Leak check: Lounge reef");
  });

  it("gives a valid empty calendar when there is nothing to show", () => {
    const ics = buildCalendar({ projects: [], visits: [], appUrl: "http://app.test", calendarName: "Projects" });
    expect(ics).toContain("BEGIN:VCALENDAR");
    expect(ics).toContain("END:VCALENDAR");
  });
});
