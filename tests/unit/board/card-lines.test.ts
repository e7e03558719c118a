import { describe, expect, it } from "vitest";
import { cardStatusLines } from "@/components/board/card-lines";

const now = new Date("2026-11-30T12:00:00Z");
const base = { stageEnteredAt: "2026-11-29T09:00:00Z", lateBy: 0, quarantineDaysLeft: null };

describe("a card's status lines", () => {
  it("a card on time says only when it arrived", () => {
    expect(cardStatusLines(base, now)).toEqual([{ key: "since", text: "here since yesterday", tone: "quiet" }]);
  });

  it("a card late for its own stage says by how much, as a caution", () => {
    expect(cardStatusLines({ ...base, lateBy: 1 }, now)[0]).toEqual({ key: "since", text: "here since yesterday · 1 day over this stage's usual time", tone: "caution" });
    expect(cardStatusLines({ ...base, lateBy: 3 }, now)[0].text).toBe("here since yesterday · 3 days over this stage's usual time");
  });

  it("fish in quarantine show the days left, and a finished quarantine says the fish are ready", () => {
    expect(cardStatusLines({ ...base, quarantineDaysLeft: 5 }, now)[1]).toEqual({ key: "quarantine", text: "Fish in quarantine: 5 days left", tone: "quiet" });
    expect(cardStatusLines({ ...base, quarantineDaysLeft: 1 }, now)[1].text).toBe("Fish in quarantine: 1 day left");
    expect(cardStatusLines({ ...base, quarantineDaysLeft: 0 }, now)[1]).toEqual({ key: "quarantine", text: "Fish ready to leave quarantine", tone: "ok" });
  });
});

describe("a card in service", () => {
  it("shows the next visit's day, quietly", () => {
    expect(cardStatusLines({ ...base, nextServiceVisitAt: "2026-12-08T09:00:00Z", overdueVisits: 0 }, now)).toEqual([
      { key: "since", text: "here since yesterday", tone: "quiet" },
      { key: "service-next", text: "Next visit 8 Dec", tone: "quiet" },
    ]);
  });
  it("puts overdue visits before the next one, as a danger line", () => {
    const lines = cardStatusLines({ ...base, nextServiceVisitAt: "2027-01-05T09:00:00Z", overdueVisits: 2 }, now);
    expect(lines[1]).toEqual({ key: "service-overdue", text: "2 visits overdue, no report", tone: "danger" });
    expect(lines[2].text).toBe("Next visit 5 Jan 2027");
    expect(cardStatusLines({ ...base, overdueVisits: 1 }, now)[1].text).toBe("1 visit overdue, no report");
  });
  it("a card with no plan shows no service line", () => {
    expect(cardStatusLines({ ...base, nextServiceVisitAt: null, overdueVisits: 0 }, now)).toHaveLength(1);
  });
});
