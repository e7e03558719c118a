import { describe, expect, it } from "vitest";
import { estimateNitrateRise, RISE_DEFAULTS } from "@/lib/service/nitrate-rise";

const DAY = 86_400_000;
const now = new Date("2026-06-01T12:00:00Z");
const ago = (days: number) => new Date(now.getTime() - days * DAY);
const r = (daysAgo: number, nitrateMgL: number | null) => ({ takenAt: ago(daysAgo), nitrateMgL });

// The expected rises are arithmetic on the readings below (mg/L difference / days between).

describe("estimateNitrateRise", () => {
  it("the defaults: 90 days of tests, two rising pairs, a day apart at least", () => {
    expect(RISE_DEFAULTS).toEqual({ windowDays: 90, minPairs: 2, minGapDays: 1 });
  });

  it("weekly tests before and after each change: the rises between visits, not the drops at them", () => {
    // After-change 15 → before-next 22 over 7 days = 1/day, twice; the drops a day later are left out
    const readings = [r(22, 22), r(21, 15), r(14, 22), r(13, 15), r(6, 22)];
    const rise = estimateNitrateRise(readings, now)!;
    expect(rise.pairs).toBe(2);
    expect(rise.risePerDayMgL).toBeCloseTo(1, 9);
    expect(rise.fromAt).toEqual(ago(21));
    expect(rise.toAt).toEqual(ago(6));
  });

  it("takes the median of the rising pairs, so one odd pair does not set it", () => {
    // Rises per day: 1 (10→17 in 7), 3 (17→38 in 7), 2 (10→24 in 7); median 2
    const readings = [r(30, 10), r(23, 17), r(16, 38), r(15, 10), r(8, 24)];
    expect(estimateNitrateRise(readings, now)!.risePerDayMgL).toBeCloseTo(2, 9);
  });

  it("an even count takes the mean of the middle two", () => {
    // Rises per day: 1, 2 (median of 1 and 2 is 1.5)
    const readings = [r(20, 10), r(10, 20), r(9, 5), r(4, 15)];
    expect(estimateNitrateRise(readings, now)!.risePerDayMgL).toBeCloseTo(1.5, 9);
  });

  it("readings out of order are sorted by when they were taken", () => {
    const readings = [r(4, 15), r(10, 20), r(20, 10), r(9, 5)];
    expect(estimateNitrateRise(readings, now)!.risePerDayMgL).toBeCloseTo(1.5, 9);
  });

  it("too few rising pairs gives no estimate", () => {
    expect(estimateNitrateRise([], now)).toBeNull();
    expect(estimateNitrateRise([r(10, 10), r(3, 17)], now)).toBeNull();
    expect(estimateNitrateRise([r(10, 10), r(3, 17)], now, { minPairs: 1 })!.risePerDayMgL).toBeCloseTo(1, 9);
  });

  it("no rising pair is no measurement, even when no minimum is asked for", () => {
    expect(estimateNitrateRise([r(20, 10), r(13, 5)], now, { minPairs: 0 })).toBeNull();
    expect(estimateNitrateRise([], now, { minPairs: 0 })).toBeNull();
  });

  it("a flat pair says nothing about the rise", () => {
    expect(estimateNitrateRise([r(20, 10), r(13, 10), r(6, 10)], now, { minPairs: 1 })).toBeNull();
  });

  it("tests closer than the minimum gap are not compared", () => {
    // 10 → 12 in half a day is left out; 12 → 19 in 7 days is 1/day
    const readings = [r(10, 10), r(9.5, 12), r(2.5, 19)];
    const rise = estimateNitrateRise(readings, now, { minPairs: 1 })!;
    expect(rise.pairs).toBe(1);
    expect(rise.risePerDayMgL).toBeCloseTo(1, 9);
    // exactly one day apart counts
    expect(estimateNitrateRise([r(3, 10), r(2, 12)], now, { minPairs: 1 })!.risePerDayMgL).toBeCloseTo(2, 9);
  });

  it("tests without a nitrate figure are skipped, not counted as zero", () => {
    const readings = [r(20, 10), r(15, null), r(13, 17), r(6, 24)];
    const rise = estimateNitrateRise(readings, now)!;
    expect(rise.pairs).toBe(2);
    expect(rise.risePerDayMgL).toBeCloseTo(1, 9);
  });

  it("only tests inside the window count; one on its first instant does", () => {
    const readings = [r(200, 0), r(100, 50), r(90, 10), r(83, 17), r(76, 24)];
    const rise = estimateNitrateRise(readings, now)!;
    expect(rise.pairs).toBe(2);
    expect(rise.fromAt).toEqual(ago(90));
    expect(estimateNitrateRise(readings, now, { windowDays: 80 })).toBeNull();
  });

  it("tests dated after now are left out", () => {
    const readings = [r(20, 10), r(13, 17), r(-5, 100)];
    expect(estimateNitrateRise(readings, now, { minPairs: 1 })!.pairs).toBe(1);
    expect(estimateNitrateRise([r(7, 10), r(0, 17)], now, { minPairs: 1 })!.pairs).toBe(1);
  });
});
