import { describe, expect, it } from "vitest";
import { installDateOf, shiftInstallVisits } from "@/lib/install/install-day-dates";

const at = (iso: string) => new Date(iso);

describe("installDateOf", () => {
  it("files an install day under the company's own calendar date", () => {
    // 07:30 on 10 March in a zone at UTC+13 is still 9 March in UTC (offsets from the IANA time zone database).
    expect(installDateOf(at("2031-03-09T18:30:00Z"), "Pacific/Auckland")).toBe("2031-03-10");
    expect(installDateOf(at("2031-03-09T18:30:00Z"), "UTC")).toBe("2031-03-09");
    // 20:00 on 9 March in New York (UTC−4 from 9 March 2031) is 10 March in UTC.
    expect(installDateOf(at("2031-03-10T00:00:00Z"), "America/New_York")).toBe("2031-03-09");
  });
});

describe("shiftInstallVisits", () => {
  it("moves the booked install day to the new date at the same wall-clock time", () => {
    const moved = shiftInstallVisits([{ id: "a", startsAt: at("2031-03-10T09:00:00Z") }], "2031-03-17", "UTC");
    expect(moved).toEqual([{ id: "a", startsAt: at("2031-03-17T09:00:00Z") }]);
  });
  it("keeps 09:00 at 09:00 across a clock change", () => {
    // Berlin is UTC+1 before 30 March 2031 and UTC+2 after (EU summer time: the last Sunday of March).
    const moved = shiftInstallVisits([{ id: "a", startsAt: at("2031-03-20T08:00:00Z") }], "2031-04-03", "Europe/Berlin");
    expect(moved).toEqual([{ id: "a", startsAt: at("2031-04-03T07:00:00Z") }]);
  });
  it("keeps the days between the visits of a multi-day install, whichever order they come in", () => {
    const moved = shiftInstallVisits(
      [
        { id: "second", startsAt: at("2031-03-11T08:00:00Z") },
        { id: "first", startsAt: at("2031-03-10T09:00:00Z") },
      ],
      "2031-03-05",
      "UTC",
    );
    expect(moved).toEqual([
      { id: "second", startsAt: at("2031-03-06T08:00:00Z") },
      { id: "first", startsAt: at("2031-03-05T09:00:00Z") },
    ]);
  });
  it("moves nothing when the first visit is already on the date, or when none is booked", () => {
    expect(shiftInstallVisits([{ id: "a", startsAt: at("2031-03-10T09:00:00Z") }], "2031-03-10", "UTC")).toEqual([]);
    expect(shiftInstallVisits([], "2031-03-10", "UTC")).toEqual([]);
  });
  it("reads the first visit's date in the company's zone, not UTC's", () => {
    // 07:30 on 10 March in Auckland is 18:30 on 9 March UTC; moving to 12 March is two days, not three.
    const moved = shiftInstallVisits([{ id: "a", startsAt: at("2031-03-09T18:30:00Z") }], "2031-03-12", "Pacific/Auckland");
    expect(moved).toEqual([{ id: "a", startsAt: at("2031-03-11T18:30:00Z") }]);
  });
});
