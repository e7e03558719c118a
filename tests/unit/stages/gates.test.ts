import { describe, expect, it } from "vitest";
import { checkGate, moveDirection, needsCycleFacts, nextStageNeeds, reasonsInto, type GateFacts } from "@/lib/stages/gates";

const none: GateFacts = {
  survey: null,
  loadApproval: "none",
  aquascapeChecklist: { total: 0, done: 0 },
  leak: { filled: false, after24hPassed: null },
  cycle: null,
  stockingBatches: 0,
  deposit: "not_invoiced",
};
const all: GateFacts = {
  survey: { complete: true },
  loadApproval: "current",
  aquascapeChecklist: { total: 4, done: 4 },
  leak: { filled: true, after24hPassed: true },
  cycle: { ready: true, reasons: [] },
  stockingBatches: 1,
  deposit: "paid",
};

describe("checkGate", () => {
  it("opens every gate when every record is in place", () => {
    expect(checkGate({ from: "site_survey", to: "in_service", facts: all })).toEqual({ open: true, reasons: [] });
  });

  it("never meets a gate staying put or going back", () => {
    expect(checkGate({ from: "cycling", to: "cycling", facts: none }).open).toBe(true);
    expect(checkGate({ from: "in_service", to: "site_survey", facts: none }).open).toBe(true);
  });

  it("names the survey when it is missing or unfinished", () => {
    expect(checkGate({ from: "site_survey", to: "stand_load_check", facts: none }).reasons[0]).toMatch(/^The site survey isn't complete: /);
    expect(reasonsInto("stand_load_check", { ...none, survey: { complete: false } })[0]).toMatch(/^The site survey isn't complete: /);
  });

  it("tells a stale load approval from a missing one", () => {
    expect(reasonsInto("aquascape", { ...none, deposit: "paid" })).toEqual(["The load check hasn't been approved by the lead."]);
    expect(reasonsInto("aquascape", { ...all, loadApproval: "stale" })).toEqual(["The load check was approved for an earlier design; approve it again."]);
  });

  it("needs the deposit paid for aquascape, unless the schedule asks none", () => {
    expect(reasonsInto("aquascape", none)).toEqual(["The load check hasn't been approved by the lead.", "The deposit isn't paid yet: the client hasn't accepted a quote."]);
    expect(reasonsInto("aquascape", { ...all, deposit: "unpaid" })).toEqual(["The deposit isn't paid yet: glass is ordered and install day booked once it is."]);
    expect(reasonsInto("aquascape", { ...all, deposit: "not_required" })).toEqual([]);
    expect(reasonsInto("aquascape", all)).toEqual([]);
  });

  it("counts the aquascape items left, and refuses an empty checklist", () => {
    expect(reasonsInto("fill_leak_test", { ...all, aquascapeChecklist: { total: 5, done: 2 } })[0]).toContain("3 items are left of 5");
    expect(reasonsInto("fill_leak_test", { ...all, aquascapeChecklist: { total: 5, done: 4 } })[0]).toContain("1 item is left of 5");
    expect(reasonsInto("fill_leak_test", { ...all, aquascapeChecklist: { total: 0, done: 0 } })).toHaveLength(1);
  });

  it("needs the fill and a passing 24-hour check for cycling", () => {
    expect(reasonsInto("cycling", none)).toHaveLength(2);
    expect(reasonsInto("cycling", { ...all, leak: { filled: true, after24hPassed: false } })[0]).toContain("didn't pass");
    expect(reasonsInto("cycling", { ...all, leak: { filled: true, after24hPassed: true } })).toEqual([]);
  });

  it("passes the cycle gate's own reasons through", () => {
    expect(reasonsInto("first_stocking", { ...all, cycle: { ready: false, reasons: ["Nitrite still reads 0.5 mg/L."] } })).toEqual(["Nitrite still reads 0.5 mg/L."]);
    expect(reasonsInto("first_stocking", { ...all, cycle: null })).toHaveLength(1);
  });

  it("needs a batch of fish for in service", () => {
    expect(reasonsInto("in_service", { ...all, stockingBatches: 0 })).toHaveLength(1);
  });

  it("checks every gate on a jump, labelling each by stage", () => {
    const r = checkGate({ from: "site_survey", to: "fill_leak_test", facts: { ...none, survey: { complete: true } } });
    expect(r.open).toBe(false);
    expect(r.reasons).toHaveLength(3);
    expect(r.reasons[0]).toMatch(/^Into Aquascape: /);
    expect(r.reasons[1]).toMatch(/^Into Aquascape: The deposit/);
    expect(r.reasons[2]).toMatch(/^Into Fill & leak test: /);
  });
});

describe("nextStageNeeds and helpers", () => {
  it("reports the next gate, or null at the last stage", () => {
    expect(nextStageNeeds("site_survey", all)).toEqual([]);
    expect(nextStageNeeds("stand_load_check", { ...none, deposit: "paid" })).toEqual(["The load check hasn't been approved by the lead."]);
    expect(nextStageNeeds("stand_load_check", { ...all, deposit: "unpaid" })?.[0]).toMatch(/^The deposit isn't paid yet/);
    expect(nextStageNeeds("in_service", none)).toBeNull();
  });

  it("knows direction and when the cycle must be evaluated", () => {
    expect(moveDirection("aquascape", "site_survey")).toBe("backward");
    expect(moveDirection("aquascape", "cycling")).toBe("forward");
    expect(moveDirection("aquascape", "aquascape")).toBe("same");
    expect(needsCycleFacts("cycling", "first_stocking")).toBe(true);
    expect(needsCycleFacts("site_survey", "in_service")).toBe(true);
    expect(needsCycleFacts("first_stocking", "in_service")).toBe(false);
    expect(needsCycleFacts("site_survey", "cycling")).toBe(false);
  });
});
