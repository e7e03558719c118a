import { describe, expect, it } from "vitest";
import { describeRecurrence, occurrencesBetween, parseRule, ruleBody, type Recurrence } from "@/lib/service/recurrence";
import { localTime, zonedInstant } from "@/lib/service/local-dates";

const days = (list: { occurrenceOn: string }[]) => list.map((o) => o.occurrenceOn);

describe("rule bodies", () => {
  it("round-trips every shape the plan form writes", () => {
    const shapes: Recurrence[] = [
      { kind: "weekly", everyWeeks: 1, weekday: "MO" },
      { kind: "weekly", everyWeeks: 2, weekday: "TU" },
      { kind: "monthly", dayOfMonth: 15 },
      { kind: "monthly", dayOfMonth: 31 },
    ];
    for (const r of shapes) expect(parseRule(ruleBody(r))).toEqual(r);
    expect(ruleBody({ kind: "monthly", dayOfMonth: 30 })).toBe("FREQ=MONTHLY;BYMONTHDAY=28,29,30;BYSETPOS=-1");
  });
  it("refuses bodies it did not write", () => {
    expect(parseRule("FREQ=DAILY")).toBeNull();
    expect(parseRule("FREQ=WEEKLY;INTERVAL=13;BYDAY=MO")).toBeNull();
    expect(parseRule("FREQ=MONTHLY;BYMONTHDAY=30")).toBeNull();
    expect(parseRule("FREQ=MONTHLY;BYMONTHDAY=29,31;BYSETPOS=-1")).toBeNull();
  });
  it("says the interval in words", () => {
    expect(describeRecurrence({ kind: "weekly", everyWeeks: 2, weekday: "TU" })).toBe("Every 2 weeks on Tuesday");
    expect(describeRecurrence({ kind: "weekly", everyWeeks: 1, weekday: "FR" })).toBe("Every Friday");
    expect(describeRecurrence({ kind: "monthly", dayOfMonth: 3 })).toBe("Monthly on the 3rd");
    expect(describeRecurrence({ kind: "monthly", dayOfMonth: 31 })).toBe("Monthly on the 31st (or the month's last day when shorter)");
  });
});

describe("occurrencesBetween", () => {
  it("every 2 weeks on Tuesday from the first Tuesday on or after the start", () => {
    // 2027-01-06 is a Wednesday (calendar arithmetic), so the first Tuesday is the 12th.
    const plan = { rule: ruleBody({ kind: "weekly", everyWeeks: 2, weekday: "TU" }), startsOn: "2027-01-06", startTime: "09:00", timeZone: "UTC" };
    const got = occurrencesBetween(plan, new Date("2027-01-01T00:00:00Z"), new Date("2027-02-28T00:00:00Z"));
    expect(days(got)).toEqual(["2027-01-12", "2027-01-26", "2027-02-09", "2027-02-23"]);
    expect(got[0].startsAt.toISOString()).toBe("2027-01-12T09:00:00.000Z");
  });

  it("a window starting mid-series keeps the series' fortnight, not the window's", () => {
    const plan = { rule: ruleBody({ kind: "weekly", everyWeeks: 2, weekday: "TU" }), startsOn: "2027-01-06", startTime: "09:00", timeZone: "UTC" };
    expect(days(occurrencesBetween(plan, new Date("2027-01-13T00:00:00Z"), new Date("2027-02-10T00:00:00Z")))).toEqual(["2027-01-26", "2027-02-09"]);
  });

  it("monthly on the 31st clamps to the last day of shorter months", () => {
    const plan = { rule: ruleBody({ kind: "monthly", dayOfMonth: 31 }), startsOn: "2027-01-01", startTime: "10:00", timeZone: "UTC" };
    const got = occurrencesBetween(plan, new Date("2027-01-01T00:00:00Z"), new Date("2027-06-01T00:00:00Z"));
    // 2027 is not a leap year: February has 28 days; April 30.
    expect(days(got)).toEqual(["2027-01-31", "2027-02-28", "2027-03-31", "2027-04-30", "2027-05-31"]);
    const leap = occurrencesBetween(plan, new Date("2028-02-01T00:00:00Z"), new Date("2028-03-01T00:00:00Z"));
    expect(days(leap)).toEqual(["2028-02-29"]);
  });

  it("keeps 09:00 local across the European spring change", () => {
    // Europe/Berlin: CET (UTC+1) until 2027-03-28 01:00 UTC, then CEST (UTC+2) — EU summer-time rule (last Sunday of March).
    const plan = { rule: ruleBody({ kind: "weekly", everyWeeks: 1, weekday: "TH" }), startsOn: "2027-03-01", startTime: "09:00", timeZone: "Europe/Berlin" };
    const got = occurrencesBetween(plan, new Date("2027-03-20T00:00:00Z"), new Date("2027-04-05T00:00:00Z"));
    expect(days(got)).toEqual(["2027-03-25", "2027-04-01"]);
    expect(got.map((o) => o.startsAt.toISOString())).toEqual(["2027-03-25T08:00:00.000Z", "2027-04-01T07:00:00.000Z"]);
    for (const o of got) expect(localTime(o.startsAt, "Europe/Berlin")).toBe("09:00");
  });

  it("keeps 09:00 local across the US autumn change", () => {
    // America/New_York: EDT (UTC-4) until 2027-11-07 06:00 UTC, then EST (UTC-5) — US rule (first Sunday of November).
    const plan = { rule: ruleBody({ kind: "weekly", everyWeeks: 1, weekday: "SA" }), startsOn: "2027-10-01", startTime: "09:00", timeZone: "America/New_York" };
    const got = occurrencesBetween(plan, new Date("2027-11-01T00:00:00Z"), new Date("2027-11-15T00:00:00Z"));
    expect(days(got)).toEqual(["2027-11-06", "2027-11-13"]);
    expect(got.map((o) => o.startsAt.toISOString())).toEqual(["2027-11-06T13:00:00.000Z", "2027-11-13T14:00:00.000Z"]);
  });

  it("uses the local date, not the UTC one, for a zone far from UTC", () => {
    // 08:00 on a Monday in Pacific/Auckland (UTC+13 in January, NZ daylight time) is Sunday 19:00 UTC.
    const plan = { rule: ruleBody({ kind: "weekly", everyWeeks: 1, weekday: "MO" }), startsOn: "2027-01-01", startTime: "08:00", timeZone: "Pacific/Auckland" };
    const got = occurrencesBetween(plan, new Date("2027-01-09T00:00:00Z"), new Date("2027-01-12T00:00:00Z"));
    expect(days(got)).toEqual(["2027-01-11"]);
    expect(got[0].startsAt.toISOString()).toBe("2027-01-10T19:00:00.000Z");
  });

  it("an empty or backwards window has no visits", () => {
    const plan = { rule: ruleBody({ kind: "weekly", everyWeeks: 1, weekday: "MO" }), startsOn: "2027-01-01", startTime: "08:00", timeZone: "UTC" };
    expect(occurrencesBetween(plan, new Date("2027-02-01T00:00:00Z"), new Date("2027-01-01T00:00:00Z"))).toEqual([]);
  });
});

describe("zonedInstant", () => {
  it("a time skipped by the spring change lands after the jump", () => {
    // Europe/Berlin skips 02:00–03:00 local on 2027-03-28; 02:30 reads as 03:30 CEST = 01:30 UTC.
    expect(zonedInstant("2027-03-28", "02:30", "Europe/Berlin").toISOString()).toBe("2027-03-28T01:30:00.000Z");
  });
  it("a time met twice in autumn takes the first", () => {
    // Europe/Berlin repeats 02:00–03:00 local on 2027-10-31; the first 02:30 is CEST = 00:30 UTC.
    expect(zonedInstant("2027-10-31", "02:30", "Europe/Berlin").toISOString()).toBe("2027-10-31T00:30:00.000Z");
  });
});
