import { describe, expect, it } from "vitest";
import { DEFAULT_QUARANTINE_DAYS, directBatchQuarantineReason, quarantineDaysLeft, quarantineEndsAt, quarantineVerdict } from "@/lib/stocking/quarantine";
import { applyEvent, censusOf, growthSeries } from "@/lib/stocking/census";
import { groupSentence, growthWords } from "@/lib/stocking/client-words";
import { tankWaterKind } from "@/lib/stocking/species";
import { insideLengthMm } from "@/lib/stocking/tank-facts";

const DAY = 86_400_000;
const start = new Date("2026-11-01T09:00:00Z");

describe("quarantine", () => {
  it("defaults to 28 days (common practice: about four weeks)", () => {
    expect(DEFAULT_QUARANTINE_DAYS).toBe(28);
    expect(quarantineEndsAt(start, 28).toISOString()).toBe("2026-11-29T09:00:00.000Z");
  });
  it("counts whole days left, rounding up, never below zero", () => {
    expect(quarantineDaysLeft(start, 28, new Date(start.getTime() + 10 * DAY))).toBe(18);
    expect(quarantineDaysLeft(start, 28, new Date(start.getTime() + 27.5 * DAY))).toBe(1);
    expect(quarantineDaysLeft(start, 28, new Date(start.getTime() + 40 * DAY))).toBe(0);
  });
  it("lets a batch out when the period has run or the lead gave a reason", () => {
    const early = new Date(start.getTime() + 5 * DAY);
    expect(quarantineVerdict({ startedAt: start, days: 28, now: early, override: null })).toEqual({ done: false, reason: "Quarantine runs 28 days; 23 days are left." });
    expect(quarantineVerdict({ startedAt: start, days: 28, now: early, override: "Fish came from our own holding system" }).done).toBe(true);
    expect(quarantineVerdict({ startedAt: start, days: 28, now: new Date(start.getTime() + 28 * DAY), override: null }).done).toBe(true);
    expect(quarantineVerdict({ startedAt: null, days: 28, now: early, override: null }).done).toBe(false);
  });
});

describe("fish recorded straight into the display", () => {
  it("need the full period, counted inclusively: exactly the company's days is enough, one fewer is not", () => {
    expect(directBatchQuarantineReason({ days: 28, requiredDays: 28, override: null })).toBeNull();
    expect(directBatchQuarantineReason({ days: 40, requiredDays: 28, override: null })).toBeNull();
    expect(directBatchQuarantineReason({ days: 27, requiredDays: 28, override: null })).toBe(
      "New fish are quarantined for 28 days before the display; this batch had 27 days of quarantine. Put it in a holding tank through the stocking plan, or the lead records why it can go in now.",
    );
  });
  it("say plainly when no quarantine was recorded, and use the singular for one day", () => {
    expect(directBatchQuarantineReason({ days: null, requiredDays: 28, override: null })).toMatch(/this batch had no quarantine recorded\./);
    expect(directBatchQuarantineReason({ days: 1, requiredDays: 28, override: null })).toMatch(/this batch had 1 day of quarantine\./);
  });
  it("go in with the lead's written reason, and need nothing when the company asks for none", () => {
    expect(directBatchQuarantineReason({ days: null, requiredDays: 28, override: "Bred in our own holding system" })).toBeNull();
    expect(directBatchQuarantineReason({ days: null, requiredDays: 0, override: null })).toBeNull();
  });
});

describe("census", () => {
  it("follows every kind of event", () => {
    const events = [
      { kind: "added" as const, count: 8 },
      { kind: "lost" as const, count: 1 },
      { kind: "to_holding" as const, count: 2 },
      { kind: "from_holding" as const, count: 1 },
      { kind: "rehomed" as const, count: 1, place: "holding" as const },
      { kind: "measured" as const, count: null },
      { kind: "behaviour" as const, count: null },
      { kind: "rehomed" as const, count: 2 },
    ];
    expect(censusOf(events)).toEqual({ display: 4, holding: 0 });
  });
  it("refuses to move or remove more fish than a place holds", () => {
    const r = applyEvent({ display: 3, holding: 0 }, { kind: "to_holding", count: 4 });
    expect(r).toEqual({ ok: false, message: "Only 3 fish are in the display; you can't move or remove 4." });
    expect(applyEvent({ display: 3, holding: 0 }, { kind: "from_holding", count: 1 }).ok).toBe(false);
    expect(applyEvent({ display: 3, holding: 0 }, { kind: "lost", count: 0 })).toEqual({ ok: false, message: "Enter how many fish, one or more." });
  });
  it("orders measurements for the growth chart", () => {
    const s = growthSeries([
      { kind: "measured", at: new Date(2026, 1, 2), lengthMm: 30 },
      { kind: "lost", at: new Date(2026, 1, 1), lengthMm: null },
      { kind: "measured", at: new Date(2026, 0, 1), lengthMm: 20 },
    ]);
    expect(s.map((m) => m.lengthMm)).toEqual([20, 30]);
  });
});

describe("plain words for the client", () => {
  it("says how many fish, where they are, and how they behave", () => {
    expect(groupSentence({ commonName: "Neon tetra", temperament: "peaceful", level: "middle", census: { display: 6, holding: 0 } })).toBe(
      "Neon tetra: 6 fish in your tank. A calm fish that swims in open water.",
    );
    expect(groupSentence({ commonName: "Bristlenose", temperament: "peaceful", level: "bottom", census: { display: 0, holding: 1 } })).toBe(
      "Bristlenose: none in your tank right now (1 resting in our holding tank). A calm fish that swims near the bottom.",
    );
  });
  it("describes growth against the adult size", () => {
    expect(growthWords([], 50)).toBeNull();
    expect(growthWords([{ lengthCm: 2, when: "4 Nov" }, { lengthCm: 3.5, when: "2 Dec" }], 45)).toBe("Last measured at about 3.5 cm, up from 2.0 cm on 4 Nov; fully grown is about 5 cm.");
  });
});

describe("the tank as the checks see it", () => {
  it("treats salt water below 25 psu as brackish (common practice)", () => {
    expect(tankWaterKind("fresh")).toBe("fresh");
    expect(tankWaterKind("salt")).toBe("salt");
    expect(tankWaterKind("salt", 35)).toBe("salt");
    expect(tankWaterKind("salt", 12)).toBe("brackish");
  });
  it("measures length inside the glass", () => {
    expect(insideLengthMm({ shape: "rectangular", lengthMm: 1200, panelThicknessMm: 12 } as never)).toBe(1176);
    expect(insideLengthMm({ shape: "cylinder", diameterMm: 900, panelThicknessMm: 10 } as never)).toBe(880);
  });
});
