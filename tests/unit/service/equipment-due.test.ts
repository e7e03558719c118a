import { describe, expect, it } from "vitest";
import {
  companyIntervalOverrides,
  dueState,
  dueWords,
  effectiveKindIntervals,
  equipmentCautions,
  equipmentDateProblems,
  nextServiceDue,
  pieceDue,
  serviceIntervalFor,
  warrantyState,
  warrantyWords,
} from "@/lib/service/equipment-due";
import { DEFAULT_SERVICE_INTERVAL_DAYS } from "@/lib/service/equipment-kinds";

describe("the service interval of a piece", () => {
  it("is the piece's own before the company's before the kind's common-practice default", () => {
    expect(serviceIntervalFor({ kind: "canister filter", serviceIntervalDays: 60 }, { "canister filter": 90 })).toEqual({ days: 60, source: "piece" });
    expect(serviceIntervalFor({ kind: "canister filter", serviceIntervalDays: null }, { "canister filter": 90 })).toEqual({ days: 90, source: "company" });
    expect(serviceIntervalFor({ kind: "canister filter", serviceIntervalDays: null }, {})).toEqual({ days: DEFAULT_SERVICE_INTERVAL_DAYS["canister filter"], source: "common practice" });
  });

  it("is none when the company blanked the kind, or the kind has no routine service", () => {
    expect(serviceIntervalFor({ kind: "heater", serviceIntervalDays: null }, { heater: null })).toBeNull();
    expect(serviceIntervalFor({ kind: "other", serviceIntervalDays: null }, {})).toBeNull();
    // A piece's own interval still counts when the company has none for the kind.
    expect(serviceIntervalFor({ kind: "other", serviceIntervalDays: 30 }, { other: null })).toEqual({ days: 30, source: "piece" });
  });

  it("keeps only the company's values that differ from the defaults", () => {
    expect(companyIntervalOverrides({ "canister filter": 120, heater: 90, lighting: null, other: 400 })).toEqual({ heater: 90, lighting: null, other: 400 });
    const eff = effectiveKindIntervals({ heater: 90, lighting: null });
    expect(eff.heater).toBe(90);
    expect(eff.lighting).toBeNull();
    expect(eff["canister filter"]).toBe(120);
  });
});

describe("the next service due", () => {
  it("counts from the last service, else from the install date", () => {
    expect(nextServiceDue({ lastServicedOn: "2026-03-01", installedOn: "2025-01-01", intervalDays: 120 })).toBe("2026-06-29");
    expect(nextServiceDue({ lastServicedOn: null, installedOn: "2026-01-10", intervalDays: 30 })).toBe("2026-02-09");
  });

  it("is unknown with no interval, or never serviced and no install date", () => {
    expect(nextServiceDue({ lastServicedOn: "2026-03-01", installedOn: null, intervalDays: null })).toBeNull();
    expect(nextServiceDue({ lastServicedOn: null, installedOn: null, intervalDays: 90 })).toBeNull();
  });

  it("crosses month ends and leap days by the calendar", () => {
    // 2028 is a leap year (divisible by 4, not a century); 2027 and 2100 are not.
    expect(nextServiceDue({ lastServicedOn: "2028-02-28", installedOn: null, intervalDays: 1 })).toBe("2028-02-29");
    expect(nextServiceDue({ lastServicedOn: "2027-02-28", installedOn: null, intervalDays: 1 })).toBe("2027-03-01");
    expect(nextServiceDue({ lastServicedOn: "2100-02-28", installedOn: null, intervalDays: 1 })).toBe("2100-03-01");
    expect(nextServiceDue({ lastServicedOn: "2027-01-31", installedOn: null, intervalDays: 30 })).toBe("2027-03-02");
    expect(nextServiceDue({ lastServicedOn: "2028-01-31", installedOn: null, intervalDays: 30 })).toBe("2028-03-01");
    expect(nextServiceDue({ lastServicedOn: "2027-12-31", installedOn: null, intervalDays: 365 })).toBe("2028-12-30");
    expect(nextServiceDue({ lastServicedOn: "2027-03-28", installedOn: null, intervalDays: 1 })).toBe("2027-03-29");
  });
});

describe("due wording", () => {
  it("says overdue, today, soon or later", () => {
    expect(dueState("2026-12-01", "2026-12-02")).toBe("overdue");
    expect(dueWords("2026-12-01", "2026-12-02")).toBe("overdue by 1 day");
    expect(dueWords("2026-11-22", "2026-12-02")).toBe("overdue by 10 days");
    expect(dueWords("2026-12-02", "2026-12-02")).toBe("due today");
    expect(dueWords("2026-12-03", "2026-12-02")).toBe("due soon: in 1 day");
    expect(dueWords("2026-12-16", "2026-12-02")).toBe("due soon: in 14 days");
    expect(dueState("2026-12-17", "2026-12-02")).toBe("later");
    expect(dueWords("2026-12-17", "2026-12-02")).toBe("due in 15 days");
    expect(dueState("2026-12-05", "2026-12-02", 2)).toBe("later");
  });

  it("says where a warranty stands, with its last day still covered", () => {
    expect(warrantyState(null, "2026-12-02")).toBeNull();
    expect(warrantyWords(null, "2026-12-02")).toBeNull();
    expect(warrantyState("2026-12-01", "2026-12-02")).toBe("ended");
    expect(warrantyWords("2026-11-30", "2026-12-02")).toBe("warranty ended 2 days ago");
    expect(warrantyWords("2026-12-02", "2026-12-02")).toBe("warranty ends today");
    expect(warrantyWords("2027-01-01", "2026-12-02")).toBe("warranty ending soon: 30 days left");
    expect(warrantyState("2027-01-02", "2026-12-02")).toBe("covered");
    expect(warrantyWords("2027-01-02", "2026-12-02")).toBe("under warranty for 31 days");
  });
});

describe("a piece's dates", () => {
  it("refuse a warranty ending before the install, naming the field", () => {
    expect(equipmentDateProblems({ installedOn: "2026-05-01", warrantyUntil: "2026-04-30" }, "2026-12-02")).toEqual([{ field: "warrantyUntil", message: "The warranty can't end before the piece was installed." }]);
    expect(equipmentDateProblems({ installedOn: "2026-05-01", warrantyUntil: "2026-05-01" }, "2026-12-02")).toEqual([]);
  });

  it("refuse a last service in the future or before the install", () => {
    expect(equipmentDateProblems({ installedOn: null, warrantyUntil: null, lastServicedOn: "2026-12-03" }, "2026-12-02").map((p) => p.field)).toEqual(["lastServicedOn"]);
    expect(equipmentDateProblems({ installedOn: "2026-05-01", warrantyUntil: null, lastServicedOn: "2026-04-01" }, "2026-12-02").map((p) => p.message)).toEqual(["The last service can't be before the piece was installed."]);
    expect(equipmentDateProblems({ installedOn: "2028-01-01", warrantyUntil: null }, "2026-12-02").map((p) => p.field)).toEqual(["installedOn"]);
  });
});

describe("cautions", () => {
  it("warn about mains electricity near water on powered kit and defer wiring to an electrician", () => {
    for (const kind of ["heater", "sump return pump", "lighting", "canister filter"] as const) {
      const text = equipmentCautions(kind).join(" ");
      expect(text).toMatch(/unplug/);
      expect(text).toMatch(/RCD \(GFCI\)/);
      expect(text).toMatch(/drip loop/);
      expect(text).toMatch(/licensed electrician/);
    }
  });

  it("add the gas and chemical cautions for CO2 and dosing", () => {
    expect(equipmentCautions("CO2 system")[0]).toMatch(/cylinder valve/);
    expect(equipmentCautions("dosing pump")[0]).toMatch(/gloves and eye protection/);
    expect(equipmentCautions("heater")[1]).toMatch(/cool/);
  });
});

describe("a register line", () => {
  const today = "2026-12-02";
  it("says when a never-serviced piece is due from its install date", () => {
    const d = pieceDue({ kind: "canister filter", serviceIntervalDays: null, installedOn: "2026-07-01", warrantyUntil: "2026-12-20", lastServicedOn: null }, {}, today);
    expect(d).toEqual({ interval: { days: 120, source: "common practice" }, dueOn: "2026-10-29", dueState: "overdue", dueWords: "overdue by 34 days", warrantyState: "ending soon", warrantyWords: "warranty ending soon: 18 days left" });
  });

  it("says when there is no interval, or nothing to count from", () => {
    expect(pieceDue({ kind: "other", serviceIntervalDays: null, installedOn: "2026-07-01", warrantyUntil: null, lastServicedOn: null }, {}, today).dueWords).toBe("no routine service");
    const unknown = pieceDue({ kind: "heater", serviceIntervalDays: null, installedOn: null, warrantyUntil: null, lastServicedOn: null }, {}, today);
    expect(unknown.dueWords).toBe("next service unknown: add the install date or record a service");
    expect(unknown.dueState).toBeNull();
    expect(unknown.warrantyWords).toBeNull();
  });
});
