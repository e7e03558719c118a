import { describe, expect, it } from "vitest";
import { parsePlainDate, roughlyWhen, testInWords, whatHappensNext } from "@/lib/portal/next-steps";

const now = new Date("2026-12-02T10:00:00Z");

describe("roughlyWhen", () => {
  it("speaks in days, weeks and months without false precision", () => {
    expect(roughlyWhen(new Date("2026-12-02T15:00:00Z"), now)).toBe("today");
    expect(roughlyWhen(new Date("2026-12-03T09:00:00Z"), now)).toBe("tomorrow");
    expect(roughlyWhen(new Date("2026-12-06T09:00:00Z"), now)).toBe("in 4 days");
    expect(roughlyWhen(new Date("2026-12-10T09:00:00Z"), now)).toBe("in about a week");
    expect(roughlyWhen(new Date("2026-12-23T09:00:00Z"), now)).toBe("in about 3 weeks");
    expect(roughlyWhen(new Date("2027-03-02T09:00:00Z"), now)).toBe("in about 3 months");
    expect(roughlyWhen(new Date("2026-11-20T09:00:00Z"), now)).toBe("was planned for 20 Nov");
  });
});

describe("parsePlainDate", () => {
  it("reads stored dates at midday UTC and rejects anything else", () => {
    expect(parsePlainDate("2027-01-15")?.toISOString()).toBe("2027-01-15T12:00:00.000Z");
    expect(parsePlainDate(null)).toBeNull();
    expect(parsePlainDate("15/01/2027")).toBeNull();
  });
});

describe("whatHappensNext", () => {
  it("names the next stage with its blurb, and the booked visit first", () => {
    const step = whatHappensNext({ stage: "fill_leak_test", targetHandoverDate: "2027-02-01", nextVisit: { kind: "leak check", startsAt: new Date("2026-12-03T09:00:00Z") }, now });
    expect(step.headline).toBe("Next: Cycling");
    expect(step.detail).toMatch(/Bacteria establish/);
    expect(step.when).toBe("Next visit (leak check) tomorrow, on Thursday 3 December.");
  });

  it("falls back to the install date before install, and to handover after", () => {
    expect(whatHappensNext({ stage: "site_survey", targetInstallDate: "2027-01-13", targetHandoverDate: "2027-03-01", now }).when).toBe(
      "Install day is planned in about 6 weeks (13 January).",
    );
    expect(whatHappensNext({ stage: "cycling", targetInstallDate: "2026-11-01", targetHandoverDate: "2026-12-30", now }).when).toBe(
      "Handover is planned in about 4 weeks (30 December).",
    );
  });

  it("says nothing about timing when no date lies ahead, and handles the last stage", () => {
    expect(whatHappensNext({ stage: "cycling", targetHandoverDate: "2026-11-01", now }).when).toBeNull();
    const last = whatHappensNext({ stage: "in_service", targetHandoverDate: "2027-01-01", now });
    expect(last.headline).toBe("Looking after your tank");
    expect(last.when).toBeNull();
  });
});

describe("testInWords", () => {
  it("shows each analyte with its unit, zero as a word, and skips ones not tested", () => {
    expect(testInWords({ ammoniaMgL: 0.5, nitriteMgL: 0, nitrateMgL: 10 })).toBe("ammonia 0.5 mg/L, nitrite zero, nitrate 10 mg/L");
    expect(testInWords({ ammoniaMgL: 0.25, nitriteMgL: null, nitrateMgL: null })).toBe("ammonia 0.25 mg/L");
    expect(testInWords({ ammoniaMgL: null, nitriteMgL: null, nitrateMgL: null })).toMatch(/no ammonia/);
  });
});
