import { describe, expect, it } from "vitest";
import { RECENT_HANDOVER_DAYS, attentionSince, inServiceAttention, inServiceHeaderWords, needsAttention } from "@/lib/stages/in-service-attention";

const now = new Date("2026-06-15T12:00:00Z");
const daysAgo = (d: number) => new Date(now.getTime() - d * 86_400_000);

describe("which tanks in service need attention", () => {
  it("keeps a tank on the board for the first two weeks after handover", () => {
    expect(RECENT_HANDOVER_DAYS).toBe(14);
    expect(inServiceAttention({ handedOverAt: daysAgo(0) }, now)).toEqual(["recently_handed_over"]);
    expect(inServiceAttention({ handedOverAt: daysAgo(13.9) }, now)).toEqual(["recently_handed_over"]);
  });

  it("counts a tank handed over exactly at the cut-off as recent, and one a moment older as not", () => {
    expect(needsAttention({ handedOverAt: attentionSince(now) }, now)).toBe(true);
    expect(needsAttention({ handedOverAt: new Date(attentionSince(now).getTime() - 1) }, now)).toBe(false);
    expect(attentionSince(now).toISOString()).toBe("2026-06-01T12:00:00.000Z");
  });

  it("lets an older tank through only for another signal", () => {
    const old = daysAgo(400).toISOString();
    expect(inServiceAttention({ handedOverAt: old }, now)).toEqual([]);
    expect(inServiceAttention({ handedOverAt: old, nextVisitDue: null, flagged: false }, now)).toEqual([]);
    expect(inServiceAttention({ handedOverAt: old, nextVisitDue: now }, now)).toEqual(["visit_due"]);
    expect(inServiceAttention({ handedOverAt: old, nextVisitDue: daysAgo(-1) }, now)).toEqual([]);
    expect(inServiceAttention({ handedOverAt: old, flagged: true }, now)).toEqual(["flagged"]);
    expect(inServiceAttention({ handedOverAt: old, overdueVisits: 1 }, now)).toEqual(["visit_overdue"]);
    expect(inServiceAttention({ handedOverAt: old, overdueVisits: 0 }, now)).toEqual([]);
  });

  it("gives every reason that applies, in a fixed order", () => {
    expect(inServiceAttention({ handedOverAt: daysAgo(1), nextVisitDue: daysAgo(2).toISOString(), flagged: true }, now)).toEqual(["recently_handed_over", "visit_due", "flagged"]);
  });

  it("says in the header what the cards are and how many more there are", () => {
    expect(inServiceHeaderWords(3, 0)).toBe("3 needing attention (handed over in the last 14 days or a service visit overdue)");
    expect(inServiceHeaderWords(0, 2000)).toBe("0 needing attention (handed over in the last 14 days or a service visit overdue); 2,000 more in service");
  });
});
