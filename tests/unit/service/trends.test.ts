import { describe, expect, it } from "vitest";
import { trendPoints } from "@/lib/service/trends";

const now = new Date("2026-06-01T12:00:00Z");
const at = (iso: string) => new Date(iso);
const reading = (iso: string, o: Partial<{ voided: boolean; nitrateMgL: number | null; pH: number | null; tempC: number | null }> = {}) => ({
  takenAt: at(iso),
  voided: false,
  nitrateMgL: 10,
  pH: 7.6,
  tempC: 25,
  ...o,
});

describe("trendPoints", () => {
  it("oldest first, times in milliseconds, values as measured", () => {
    const points = trendPoints([reading("2026-05-20T09:00:00Z", { nitrateMgL: 20 }), reading("2026-03-01T09:00:00Z", { pH: 7.8, tempC: 24.5 })], now);
    expect(points).toEqual([
      { at: at("2026-03-01T09:00:00Z").getTime(), nitrateMgL: 10, pH: 7.8, tempC: 24.5 },
      { at: at("2026-05-20T09:00:00Z").getTime(), nitrateMgL: 20, pH: 7.6, tempC: 25 },
    ]);
  });

  it("leaves out voided readings", () => {
    expect(trendPoints([reading("2026-05-20T09:00:00Z", { voided: true })], now)).toEqual([]);
  });

  it("leaves out readings with none of the three, keeps one with any of them", () => {
    const none = { nitrateMgL: null, pH: null, tempC: null };
    expect(trendPoints([reading("2026-05-20T09:00:00Z", none)], now)).toEqual([]);
    expect(trendPoints([reading("2026-05-20T09:00:00Z", { ...none, tempC: 26 })], now)).toHaveLength(1);
    expect(trendPoints([reading("2026-05-20T09:00:00Z", { ...none, pH: 7 })], now)).toHaveLength(1);
    expect(trendPoints([reading("2026-05-20T09:00:00Z", { ...none, nitrateMgL: 0 })], now)).toHaveLength(1);
  });

  it("leaves out readings dated after now plus the tolerance; one exactly at the edge stays", () => {
    const later = reading("2026-06-01T12:10:00Z");
    expect(trendPoints([later], now)).toEqual([]);
    expect(trendPoints([later], now, 10 * 60_000)).toHaveLength(1);
    expect(trendPoints([later], now, 10 * 60_000 - 1)).toEqual([]);
  });
});
