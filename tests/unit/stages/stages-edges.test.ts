import { describe, expect, it } from "vitest";
import { DATE_PATTERN, UUID_PATTERN } from "@/lib/stages/ids";
import { STAGES, STAGE_BLURBS, STAGE_LABELS, isStage, nextStage, stageIndex } from "@/lib/stages/stages";
import { daysSince, filtersFromQuery, filtersToQuery, isOverdue, matchesFilters, STUCK_DAYS, type FilterableCard } from "@/lib/stages/board-filters";
import { checkGate, reasonsInto, type GateFacts } from "@/lib/stages/gates";
import { compareKeys, keyBetween, keyForPlacement, moveInList } from "@/lib/stages/ordering";

const none: GateFacts = {
  survey: null,
  loadApproval: "none",
  aquascapeChecklist: { total: 0, done: 0 },
  leak: { filled: false, after24hPassed: null },
  cycle: null,
  stockingBatches: 0,
  deposit: "not_required",
};

describe("gates: every reason in full", () => {
  it("each closed gate says what is missing in a sentence a person can act on", () => {
    expect(reasonsInto("site_survey", none)).toEqual([]);
    expect(reasonsInto("stand_load_check", none)).toEqual(["The site survey isn't complete: it hasn't been started yet."]);
    expect(reasonsInto("stand_load_check", { ...none, survey: { complete: false } })).toEqual([
      "The site survey isn't complete: finish its required fields and mark it complete.",
    ]);
    expect(reasonsInto("fill_leak_test", none)).toEqual([
      "The aquascape checklist has no items yet; the lead adds them under Checklists.",
    ]);
    expect(reasonsInto("fill_leak_test", { ...none, aquascapeChecklist: { total: 3, done: 3 } })).toEqual([]);
    expect(reasonsInto("cycling", none)).toEqual([
      "The fill hasn't been recorded.",
      "The leak check 24 hours after filling hasn't been recorded.",
    ]);
    expect(reasonsInto("cycling", { ...none, leak: { filled: true, after24hPassed: false } })).toEqual([
      "The latest leak check 24 hours after filling didn't pass; fix the leak and check again.",
    ]);
    expect(reasonsInto("first_stocking", none)).toEqual(["The cycle hasn't been evaluated yet."]);
    expect(reasonsInto("first_stocking", { ...none, cycle: { ready: false, reasons: [] } })).toEqual([
      "The cycle isn't finished yet.",
    ]);
    expect(reasonsInto("first_stocking", { ...none, cycle: { ready: true, reasons: [] } })).toEqual([]);
    expect(reasonsInto("in_service", none)).toEqual(["No fish have been recorded yet; record the first batch."]);
  });

  it("a one-stage move gives the reasons as they are; a jump labels each with its stage", () => {
    expect(checkGate({ from: "aquascape", to: "fill_leak_test", facts: none }).reasons).toEqual([
      "The aquascape checklist has no items yet; the lead adds them under Checklists.",
    ]);
    expect(checkGate({ from: "aquascape", to: "cycling", facts: none }).reasons).toEqual([
      "Into Fill & leak test: The aquascape checklist has no items yet; the lead adds them under Checklists.",
      "Into Cycling: The fill hasn't been recorded.",
      "Into Cycling: The leak check 24 hours after filling hasn't been recorded.",
    ]);
  });
});

describe("stages", () => {
  it("has a label and a client blurb for every stage, and knows its order", () => {
    for (const s of STAGES) {
      expect(STAGE_LABELS[s].length).toBeGreaterThan(0);
      expect(STAGE_BLURBS[s].length).toBeGreaterThan(0);
    }
    expect(STAGES.map(stageIndex)).toEqual([0, 1, 2, 3, 4, 5, 6]);
    expect(nextStage("site_survey")).toBe("stand_load_check");
    expect(nextStage("first_stocking")).toBe("in_service");
    expect(nextStage("in_service")).toBeNull();
  });

  it("recognises only stored stage keys", () => {
    expect(isStage("cycling")).toBe(true);
    expect(isStage("Cycling")).toBe(false);
    expect(isStage(4)).toBe(false);
    expect(isStage(undefined)).toBe(false);
  });
});

describe("ids", () => {
  it("accepts only whole uuids and calendar dates", () => {
    expect(UUID_PATTERN.test("11111111-1111-4111-8111-111111111111")).toBe(true);
    expect(UUID_PATTERN.test("x11111111-1111-4111-8111-111111111111")).toBe(false);
    expect(UUID_PATTERN.test("11111111-1111-4111-8111-1111111111112")).toBe(false);
    expect(UUID_PATTERN.test("1111111-11111-4111-8111-111111111111")).toBe(false);
    expect(DATE_PATTERN.test("2026-06-15")).toBe(true);
    expect(DATE_PATTERN.test("2026-06-15T10")).toBe(false);
    expect(DATE_PATTERN.test("x2026-06-15")).toBe(false);
    expect(DATE_PATTERN.test("2026-6-15")).toBe(false);
  });
});

describe("board filters: edges", () => {
  const now = new Date("2026-06-15T10:00:00Z");
  const card: FilterableCard = {
    title: "Invented lounge reef",
    clientName: "Ada Invented",
    siteTown: "Eastmere",
    stage: "aquascape",
    stageEnteredAt: "2026-06-10T10:00:00Z",
    targetInstallDate: null,
    leadId: null,
    crew: [],
  };

  it("counts whole days since, never below zero", () => {
    expect(daysSince("2026-06-14T10:00:01Z", now)).toBe(0);
    expect(daysSince("2026-06-14T10:00:00Z", now)).toBe(1);
    expect(daysSince("2026-06-16T10:00:00Z", now)).toBe(0);
  });

  it("is overdue from exactly STUCK_DAYS in a stage, not a day before", () => {
    const entered = (days: number) => new Date(now.getTime() - days * 86_400_000).toISOString();
    expect(isOverdue({ ...card, stageEnteredAt: entered(STUCK_DAYS) }, now)).toBe(true);
    expect(isOverdue({ ...card, stageEnteredAt: entered(STUCK_DAYS - 1) }, now)).toBe(false);
    expect(isOverdue({ ...card, stage: "in_service", stageEnteredAt: entered(STUCK_DAYS + 5) }, now)).toBe(false);
  });

  it("an install date of today is not yet overdue; yesterday is", () => {
    expect(isOverdue({ ...card, targetInstallDate: "2026-06-15" }, now)).toBe(false);
    expect(isOverdue({ ...card, targetInstallDate: "2026-06-14" }, now)).toBe(true);
    expect(isOverdue({ ...card, stage: "first_stocking", targetInstallDate: "2026-06-14" }, now)).toBe(true);
  });

  it("with no filters every card matches; an overdue filter keeps overdue cards", () => {
    expect(matchesFilters(card, {}, now)).toBe(true);
    expect(matchesFilters({ ...card, targetInstallDate: "2026-06-01" }, { overdue: true }, now)).toBe(true);
    expect(matchesFilters(card, { q: "   " }, now)).toBe(true);
    expect(matchesFilters(card, { q: "  LOUNGE " }, now)).toBe(true);
    expect(matchesFilters(card, { person: "33333333-3333-4333-8333-333333333333" }, now)).toBe(false);
  });

  it("reads and writes the address strictly", () => {
    const get = (m: Record<string, string>) => (k: string) => m[k] ?? null;
    expect(filtersFromQuery(get({ q: "x".repeat(150) })).q).toHaveLength(100);
    expect(filtersFromQuery(get({ q: "" })).q).toBeUndefined();
    expect(filtersFromQuery(get({ person: "11111111-1111-4111-8111-111111111111x" })).person).toBeUndefined();
    expect(filtersFromQuery(get({ person: "x11111111-1111-4111-8111-111111111111" })).person).toBeUndefined();
    expect(filtersToQuery({ q: "  reef  " })).toBe("?q=reef");
    expect(filtersToQuery({ q: "   " })).toBe("");
    expect(filtersToQuery({ overdue: true })).toBe("?overdue=1");
    expect(filtersToQuery({ overdue: false, person: "p" })).toBe("?person=p");
  });
});

describe("ordering: edges", () => {
  it("orders by key bytes, then by id, and calls equal cards equal", () => {
    expect(compareKeys({ id: "b", position: "a0" }, { id: "a", position: "a1" })).toBe(-1);
    expect(compareKeys({ id: "a", position: "a1" }, { id: "b", position: "a0" })).toBe(1);
    expect(compareKeys({ id: "a", position: "a0" }, { id: "b", position: "a0" })).toBe(-1);
    expect(compareKeys({ id: "b", position: "a0" }, { id: "a", position: "a0" })).toBe(1);
    expect(compareKeys({ id: "a", position: "a0" }, { id: "a", position: "a0" })).toBe(0);
  });

  it("places after the first key when neighbours are crossed, and between them when in order", () => {
    expect(keyBetween("a2", "a1") > "a2").toBe(true);
    const mid = keyBetween("a0", "a2");
    expect(mid > "a0" && mid < "a2").toBe(true);
    expect(keyBetween(null, "a0") < "a0").toBe(true);
  });

  it("sorts the column before placing, and clamps a position outside it", () => {
    const col = [
      { id: "c2", position: "a2" },
      { id: "c0", position: "a0" },
      { id: "c1", position: "a1" },
    ];
    const after = keyForPlacement(col, { afterId: "c0" });
    expect(after > "a0" && after < "a1").toBe(true);
    const before = keyForPlacement(col, { beforeId: "c1" });
    expect(before > "a0" && before < "a1").toBe(true);
    expect(keyForPlacement(col, { position: -3 }) < "a0").toBe(true);
    const fractional = keyForPlacement(col, { position: 1.7 });
    expect(fractional > "a0" && fractional < "a1").toBe(true);
    expect(keyForPlacement(col, { afterId: "gone" }) > "a2").toBe(true);
  });

  it("clamps a move past either end of the list", () => {
    expect(moveInList(["a", "b", "c"], 0, 10)).toEqual(["b", "c", "a"]);
    expect(moveInList(["a", "b", "c"], 2, -4)).toEqual(["c", "a", "b"]);
  });
});
