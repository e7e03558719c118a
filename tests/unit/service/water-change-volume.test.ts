import { describe, expect, it } from "vitest";
import { waterChangeLitres } from "@/lib/service/water-change-volume";

describe("waterChangeLitres", () => {
  it("takes the plan's share of the display plus the sump, in whole litres", () => {
    expect(waterChangeLitres(20, { netVolumeL: 412.4, sumpVolumeL: 80 })).toBe(98); // 0.2 × 492.4 = 98.48
    expect(waterChangeLitres(25, { netVolumeL: 300 })).toBe(75);
    expect(waterChangeLitres(10, { netVolumeL: 305, sumpVolumeL: 0 })).toBe(31); // 30.5 rounds up
  });
  it("caps at the whole volume and gives null without a volume or a share", () => {
    expect(waterChangeLitres(150, { netVolumeL: 200 })).toBe(200);
    expect(waterChangeLitres(20, null)).toBeNull();
    expect(waterChangeLitres(0, { netVolumeL: 200 })).toBeNull();
    expect(waterChangeLitres(20, { netVolumeL: 0 })).toBeNull();
    expect(waterChangeLitres(Number.NaN, { netVolumeL: 200 })).toBeNull();
  });
});
