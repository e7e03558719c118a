import { describe, expect, it } from "vitest";
import { dueWeek, groupDueItems, itemIsFor, weekWords, type DueItem } from "@/lib/service/due-list";
import { addDays, dateWords, daysBetween, isKnownTimeZone, localDay, weekStart, zonedInstant } from "@/lib/service/local-dates";

const item = (over: Partial<DueItem> & Pick<DueItem, "key" | "day">): DueItem => ({
  type: "visit",
  projectId: "p1",
  projectTitle: "Tank A",
  title: "service visit",
  href: "/projects/p1",
  assigneeId: null,
  assigneeName: null,
  crewIds: [],
  ...over,
});

describe("days in the company's time zone", () => {
  it("put an instant on the local calendar date", () => {
    const late = new Date("2026-12-06T23:30:00Z"); // a Sunday night in UTC
    expect(localDay(late, "UTC")).toBe("2026-12-06");
    expect(localDay(late, "Pacific/Auckland")).toBe("2026-12-07"); // UTC+13 in December (from memory: NZ daylight time)
    expect(localDay(new Date("2026-12-07T03:00:00Z"), "America/Los_Angeles")).toBe("2026-12-06"); // UTC−8 in winter (from memory)
  });

  it("find noon local time, across a daylight-saving change", () => {
    expect(zonedInstant("2026-12-02", "12:00", "UTC").toISOString()).toBe("2026-12-02T12:00:00.000Z");
    expect(zonedInstant("2026-07-01", "12:00", "Europe/Berlin").toISOString()).toBe("2026-07-01T10:00:00.000Z"); // UTC+2 in summer (from memory)
    expect(zonedInstant("2026-03-29", "12:00", "Europe/Berlin").toISOString()).toBe("2026-03-29T10:00:00.000Z"); // the day clocks go forward
    expect(localDay(zonedInstant("2026-06-15", "12:00", "Pacific/Kiritimati"), "Pacific/Kiritimati")).toBe("2026-06-15");
    expect(localDay(zonedInstant("2026-06-15", "12:00", "Etc/GMT+12"), "Etc/GMT+12")).toBe("2026-06-15");
  });

  it("count days by the calendar, not by 24-hour steps", () => {
    expect(addDays("2026-03-28", 1)).toBe("2026-03-29");
    expect(daysBetween("2026-03-01", "2026-04-01")).toBe(31);
    expect(daysBetween("2028-02-01", "2028-03-01")).toBe(29);
  });

  it("read a date in words", () => {
    expect(dateWords("2028-02-29")).toBe("29 Feb 2028");
  });

  it("know the zones this runtime knows", () => {
    expect(isKnownTimeZone("UTC")).toBe(true);
    expect(isKnownTimeZone("Europe/Berlin")).toBe(true);
    expect(isKnownTimeZone("Mars/Olympus")).toBe(false);
    expect(isKnownTimeZone("")).toBe(false);
  });
});

describe("weeks", () => {
  it("run Monday to Sunday", () => {
    expect(weekStart("2026-12-02")).toBe("2026-11-30"); // a Wednesday
    expect(weekStart("2026-11-30")).toBe("2026-11-30"); // a Monday
    expect(weekStart("2026-12-06")).toBe("2026-11-30"); // a Sunday
    expect(dueWeek("2026-12-06")).toEqual({ from: "2026-11-30", to: "2026-12-06", offset: 0 });
    expect(dueWeek("2026-12-02", 1)).toEqual({ from: "2026-12-07", to: "2026-12-13", offset: 1 });
    expect(dueWeek("2026-12-30", 1)).toEqual({ from: "2027-01-04", to: "2027-01-10", offset: 1 });
    expect(dueWeek("2026-12-02", -1).from).toBe("2026-11-23");
    expect([0, 1, -1, 3].map((o) => weekWords(dueWeek("2026-12-02", o)))).toEqual(["This week", "Next week", "Last week", "Week of Mon 21 Dec"]);
  });

  it("take the company's Monday: a Sunday-night visit in UTC is next week's Monday in Auckland", () => {
    const at = new Date("2026-12-06T20:00:00Z");
    const aucklandToday = localDay(new Date("2026-12-07T01:00:00Z"), "Pacific/Auckland");
    const visit = item({ key: "v", day: localDay(at, "Pacific/Auckland") });
    const g = groupDueItems([visit], { today: aucklandToday, week: dueWeek(aucklandToday), personId: null });
    expect(g.days.map((d) => d.day)).toEqual(["2026-12-07"]);
    const utc = item({ key: "v", day: localDay(at, "UTC") });
    expect(groupDueItems([utc], { today: "2026-12-07", week: dueWeek("2026-12-07"), personId: null }).count).toBe(1); // overdue by then
    expect(groupDueItems([utc], { today: "2026-12-06", week: dueWeek("2026-12-06"), personId: null }).days[0].day).toBe("2026-12-06");
  });
});

describe("grouping the due list", () => {
  const today = "2026-12-02";
  const week = dueWeek(today);
  const items = [
    item({ key: "late-visit", day: "2026-11-20", assigneeId: "teo" }),
    item({ key: "late-filter", type: "service", day: "2026-11-29", crewIds: ["priya"] }),
    item({ key: "old-warranty", type: "warranty", day: "2026-11-01", crewIds: ["teo"] }),
    item({ key: "warranty-this-week", type: "warranty", day: "2026-12-04", crewIds: ["teo"] }),
    item({ key: "thu-visit-2", day: "2026-12-03", at: "2026-12-03T14:00:00Z", assigneeId: "teo", projectTitle: "Tank B" }),
    item({ key: "thu-visit-1", day: "2026-12-03", at: "2026-12-03T09:00:00Z", assigneeId: "priya" }),
    item({ key: "thu-service", type: "service", day: "2026-12-03", crewIds: ["teo", "priya"] }),
    item({ key: "next-week", day: "2026-12-08", assigneeId: "teo" }),
    item({ key: "today", day: today, assigneeId: null }),
  ];

  it("puts overdue work on top, then the week's days in order, visits before services before warranties", () => {
    const g = groupDueItems(items, { today, week, personId: null });
    expect(g.overdue.map((i) => i.key)).toEqual(["late-visit", "late-filter"]);
    expect(g.days.map((d) => [d.day, d.today, d.items.map((i) => i.key)])).toEqual([
      ["2026-12-02", true, ["today"]],
      ["2026-12-03", false, ["thu-visit-1", "thu-visit-2", "thu-service"]],
      ["2026-12-04", false, ["warranty-this-week"]],
    ]);
    expect(g.days[1].label).toBe("Thu 3 Dec");
    expect(g.count).toBe(7);
  });

  it("shows one person their visits and their projects' equipment", () => {
    const g = groupDueItems(items, { today, week, personId: "teo" });
    expect(g.overdue.map((i) => i.key)).toEqual(["late-visit"]);
    expect(g.days.flatMap((d) => d.items.map((i) => i.key))).toEqual(["thu-visit-2", "thu-service", "warranty-this-week"]);
    expect(itemIsFor(items[8], "teo")).toBe(false);
    expect(itemIsFor(items[8], null)).toBe(true);
  });

  it("shows an overdue item once, on top, when a past week is viewed", () => {
    const g = groupDueItems(items, { today, week: dueWeek(today, -2), personId: null });
    expect(g.overdue.map((i) => i.key)).toEqual(["late-visit", "late-filter"]);
    expect(g.days).toEqual([]);
    const next = groupDueItems(items, { today, week: dueWeek(today, 1), personId: null });
    expect(next.days.map((d) => d.items.map((i) => i.key))).toEqual([["next-week"]]);
  });

  it("is empty with nothing due", () => {
    expect(groupDueItems([], { today, week, personId: null })).toEqual({ overdue: [], days: [], count: 0 });
  });
});
