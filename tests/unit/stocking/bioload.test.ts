import { describe, expect, it } from "vitest";
import { checkBioload, estimateBioload, LITRES_PER_CM } from "@/lib/stocking/bioload";
import { line, sp, tank } from "./fixtures";

describe("bioload estimate (common practice, a rough guide)", () => {
  const tetra = sp({ commonName: "Tetra", adultLengthMm: 40 });
  it("adds adult lengths and compares them with 1 cm per 2 L of fresh water", () => {
    // 20 × 4 cm = 80 cm against 200 L / 2 = 100 cm.
    const e = estimateBioload([line(tetra, 20)], tank({ netVolumeL: 200 }))!;
    expect(LITRES_PER_CM.fresh).toBe(2);
    expect(e.fishCm).toBe(80);
    expect(e.allowanceCm).toBe(100);
    expect(e.share).toBeCloseTo(0.8);
    expect(e.rule).toContain("rough guide");
    expect(checkBioload([line(tetra, 20)], tank({ netVolumeL: 200 }))).toEqual([]);
  });
  it("notes a tank near its allowance and warns over it, stating the rule", () => {
    const near = checkBioload([line(tetra, 22)], tank({ netVolumeL: 200 }));
    expect(near[0].severity).toBe("note");
    expect(near[0].message).toMatch(/^Close to the rough stocking allowance: 88 cm of adult fish against about 100 cm \(88%\)/);
    const over = checkBioload([line(tetra, 30)], tank({ netVolumeL: 200 }));
    expect(over[0].severity).toBe("warning");
    expect(over[0].message).toContain("About 1 cm of adult fish per 2 L of net water in fresh water");
  });
  it("stocks salt water four times lighter, and says nothing without a volume", () => {
    const clown = sp({ commonName: "Clown", water: "salt", adultLengthMm: 80 });
    // 2 × 8 cm = 16 cm against 400 L / 8 = 50 cm.
    expect(estimateBioload([line(clown, 2)], tank({ water: "salt", netVolumeL: 400 }))!.share).toBeCloseTo(0.32);
    expect(estimateBioload([line(clown, 2)], tank({ netVolumeL: null }))).toBeNull();
  });
});
