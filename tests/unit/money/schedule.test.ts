import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { instalmentAmount, instalmentsDueOnMove, isOverdue, isPeriod, splitSchedule } from "@/lib/money/schedule";

describe("the payment schedule", () => {
  it("splits an accepted total into deposit, install day and balance exactly", () => {
    // 12,345.67 at 50/30/20: 617283.5 → floors 617283, 370370 (.1), 246913 (.4); the 1 left goes to the .5.
    expect(splitSchedule(1_234_567, { depositBp: 5000, progressBp: 3000 })).toEqual({ deposit: 617_284, progress: 370_370, balance: 246_913 });
    expect(splitSchedule(1000, { depositBp: 10_000, progressBp: 0 })).toEqual({ deposit: 1000, progress: 0, balance: 0 });
    expect(() => splitSchedule(1000, { depositBp: 8000, progressBp: 3000 })).toThrow(/100 %/);
  });

  it("property: the instalments add up to the total, whatever the shares", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 1e12 }), fc.integer({ min: 0, max: 10_000 }), fc.integer({ min: 0, max: 10_000 }), (total, a, b) => {
        fc.pre(a + b <= 10_000);
        const s = { depositBp: a, progressBp: b };
        const parts = splitSchedule(total, s);
        expect(parts.deposit + parts.progress + parts.balance).toBe(total);
        // Billed one by one, the balance takes what is left, so nothing is lost even if shares change midway.
        const d = instalmentAmount("deposit", total, s, 0);
        const p = instalmentAmount("progress", total, { depositBp: b, progressBp: a > 10_000 - b ? 0 : a }, d);
        const bal = instalmentAmount("balance", total, s, d + p);
        expect(d + p + bal).toBe(total);
      }),
    );
  });

  it("bills install day on the move into aquascape and the balance at handover, once each way forward", () => {
    expect(instalmentsDueOnMove("stand_load_check", "aquascape")).toEqual(["progress"]);
    expect(instalmentsDueOnMove("first_stocking", "in_service")).toEqual(["balance"]);
    expect(instalmentsDueOnMove("site_survey", "in_service")).toEqual(["progress", "balance"]);
    expect(instalmentsDueOnMove("cycling", "aquascape")).toEqual([]);
    expect(instalmentsDueOnMove("aquascape", "cycling")).toEqual([]);
  });

  it("knows months and overdue invoices", () => {
    expect(isPeriod("2026-11")).toBe(true);
    expect(isPeriod("2026-13")).toBe(false);
    expect(isOverdue({ status: "open", dueOn: "2026-11-30" }, "2026-12-01")).toBe(true);
    expect(isOverdue({ status: "open", dueOn: "2026-12-01" }, "2026-12-01")).toBe(false);
    expect(isOverdue({ status: "paid", dueOn: "2026-01-01" }, "2026-12-01")).toBe(false);
  });
});
