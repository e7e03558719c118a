import { describe, expect, it } from "vitest";
import { STUCK_DAYS, filtersFromQuery, filtersToQuery, isOverdue, matchesFilters, type FilterableCard } from "@/lib/stages/board-filters";

const now = new Date("2026-06-15T10:00:00Z");
const card: FilterableCard = {
  title: "Invented lounge reef",
  clientName: "Ada Invented",
  siteTown: "Quillhaven",
  stage: "aquascape",
  stageEnteredAt: "2026-06-10T10:00:00Z",
  targetInstallDate: "2026-07-01",
  leadId: "11111111-1111-4111-8111-111111111111",
  crew: [{ id: "22222222-2222-4222-8222-222222222222" }],
};

describe("board filters", () => {
  it("is overdue past the install date before service, or when stuck", () => {
    expect(isOverdue(card, now)).toBe(false);
    expect(isOverdue({ ...card, targetInstallDate: "2026-06-14" }, now)).toBe(true);
    expect(isOverdue({ ...card, targetInstallDate: "2026-06-14", stage: "in_service" }, now)).toBe(false);
    const stuck = new Date(now.getTime() - STUCK_DAYS * 86_400_000).toISOString();
    expect(isOverdue({ ...card, stageEnteredAt: stuck }, now)).toBe(true);
  });

  it("matches person (lead or crew) and free text over title, client and town", () => {
    expect(matchesFilters(card, { person: card.leadId! }, now)).toBe(true);
    expect(matchesFilters(card, { person: card.crew[0].id }, now)).toBe(true);
    expect(matchesFilters(card, { person: "33333333-3333-4333-8333-333333333333" }, now)).toBe(false);
    expect(matchesFilters(card, { q: "quillHAVEN" }, now)).toBe(true);
    expect(matchesFilters(card, { q: "ada" }, now)).toBe(true);
    expect(matchesFilters(card, { q: "nowhere" }, now)).toBe(false);
    expect(matchesFilters(card, { overdue: true }, now)).toBe(false);
  });

  it("round-trips through the address, ignoring malformed values", () => {
    const f = { person: card.leadId!, overdue: true, q: "reef" };
    const q = new URLSearchParams(filtersToQuery(f));
    expect(filtersFromQuery((k) => q.get(k))).toEqual(f);
    expect(filtersFromQuery((k) => ({ person: "nope", overdue: "yes" })[k] ?? null)).toEqual({ person: undefined, overdue: false, q: undefined });
    expect(filtersToQuery({})).toBe("");
  });
});
