import { describe, expect, it } from "vitest";
import { ALL_CAUTIONS, HEAVY_LIFTING, LICENSED_WORK, SCREENING_ONLY, WEIGHTS_FROM_INPUTS } from "@/lib/tank/cautions";

describe("cautions", () => {
  it("cover screening, licensed work, inputs and lifting", () => {
    expect(SCREENING_ONLY).toMatch(/screening estimate, not a structural design/);
    expect(LICENSED_WORK).toMatch(/licensed professionals/);
    expect(LICENSED_WORK).toMatch(/electrical/);
    expect(WEIGHTS_FROM_INPUTS).toMatch(/assume/);
    expect(HEAVY_LIFTING).toMatch(/enough people/);
    expect(ALL_CAUTIONS).toEqual([SCREENING_ONLY, LICENSED_WORK, WEIGHTS_FROM_INPUTS, HEAVY_LIFTING]);
  });
});
