import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";

// WCAG 2.2, "relative luminance" and "contrast ratio" definitions (W3C Recommendation, 2023).
function luminance(hex: string): number {
  const [r, g, b] = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255).map((c) => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4));
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}
function contrast(a: string, b: string): number {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (hi + 0.05) / (lo + 0.05);
}

const css = readFileSync("app/globals.css", "utf8");
const token = (name: string) => {
  const m = new RegExp(`--color-${name}:\\s*(#[0-9a-f]{6})`, "i").exec(css);
  if (!m) throw new Error(`No colour token ${name}`);
  return m[1];
};
const STAGES = ["survey", "load", "scape", "fill", "cycling", "stocking", "service"];

describe("stage colours for words", () => {
  it("meet WCAG 2.2 AA for small text (4.5:1) on white, on paper and on the stage's own wash", () => {
    for (const s of STAGES) {
      const ink = token(`stage-${s}-ink`);
      for (const bg of ["#ffffff", token("paper"), token(`stage-${s}-soft`)]) {
        expect(contrast(ink, bg), `${s} ink on ${bg}`).toBeGreaterThanOrEqual(4.5);
      }
    }
  });
  it("muted text meets it too, on white and paper", () => {
    for (const bg of ["#ffffff", token("paper")]) expect(contrast(token("muted"), bg)).toBeGreaterThanOrEqual(4.5);
  });
  it("computes the known extremes", () => {
    expect(contrast("#000000", "#ffffff")).toBeCloseTo(21, 5);
    expect(contrast("#777777", "#777777")).toBe(1);
  });
});
