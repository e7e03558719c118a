import { describe, expect, it } from "vitest";
import { COMPOUND_PER_N, NEUTRAL_KIT_STEPS, NEUTRAL_TEST_KITS, basisUnit, parseSteps, toStoredMgL, validateKit } from "@/lib/cycling/test-kits";
import { kitSteps } from "@/lib/cycling/readings";

describe("neutral kit steps", () => {
  it("are evenly spaced round values from zero, and are what kitSteps offers", () => {
    for (const steps of Object.values(NEUTRAL_KIT_STEPS)) {
      expect(steps[0]).toBe(0);
      const gaps = new Set(steps.slice(1).map((v, i) => v - steps[i]));
      expect(gaps.size).toBe(1);
    }
    expect(kitSteps).toBe(NEUTRAL_KIT_STEPS);
    expect(NEUTRAL_TEST_KITS.nitrate.steps).toBe(NEUTRAL_KIT_STEPS.nitrate);
  });
});

describe("kit basis", () => {
  it("converts a reading printed as N to the stored compound basis", () => {
    // Molar masses from IUPAC standard atomic weights (N 14.007, H 1.008, O 15.999).
    expect(COMPOUND_PER_N.ammonia).toBeCloseTo(17.031 / 14.007, 10);
    expect(toStoredMgL(1, "ammonia", "nitrogen")).toBe(1.216);
    expect(toStoredMgL(1, "nitrite", "nitrogen")).toBe(3.284);
    expect(toStoredMgL(10, "nitrate", "nitrogen")).toBe(44.266);
    expect(toStoredMgL(0, "nitrate", "nitrogen")).toBe(0);
    expect(toStoredMgL(0.5, "ammonia", "compound")).toBe(0.5);
  });
  it("names the unit a kit is read in", () => {
    expect(basisUnit("ammonia", "compound")).toBe("mg/L total ammonia (NH3 + NH4+)");
    expect(basisUnit("nitrate", "nitrogen")).toBe("mg/L as N (NO3-N)");
  });
});

describe("validateKit", () => {
  it("accepts a named kit whose steps start at 0 and rise", () => {
    expect(validateKit({ name: "Bench kit", steps: [0, 1, 2] })).toEqual([]);
  });
  it("refuses an empty name, too few steps, a non-zero start, repeats and bad numbers", () => {
    expect(validateKit({ name: " ", steps: [0, 1] }).map((p) => p.field)).toEqual(["name"]);
    expect(validateKit({ name: "A", steps: [0] })[0].message).toMatch(/between 2 and 12 steps/);
    expect(validateKit({ name: "A", steps: [0.5, 1] })[0].message).toMatch(/Start the steps at 0/);
    expect(validateKit({ name: "A", steps: [0, 1, 1] })[0].message).toMatch(/lowest to highest/);
    expect(validateKit({ name: "A", steps: [0, Number.NaN] })[0].message).toMatch(/number from 0 to 500/);
    expect(validateKit({ name: "x".repeat(61), steps: [0, 1] })[0].field).toBe("name");
  });
  it("reads steps typed with commas or spaces", () => {
    expect(parseSteps("0, 0.5 1;2")).toEqual([0, 0.5, 1, 2]);
    expect(parseSteps("0, 1,5").length).toBe(3);
    expect(parseSteps("0, a")[1]).toBeNaN();
  });
});

describe("basisUnit names every analyte on both bases", () => {
  it.each([
    ["ammonia", "nitrogen", "mg/L as N (NH3-N + NH4-N)"],
    ["nitrite", "nitrogen", "mg/L as N (NO2-N)"],
    ["nitrate", "nitrogen", "mg/L as N (NO3-N)"],
    ["ammonia", "compound", "mg/L total ammonia (NH3 + NH4+)"],
    ["nitrite", "compound", "mg/L nitrite (NO2-)"],
    ["nitrate", "compound", "mg/L nitrate (NO3-)"],
  ] as const)("%s read %s: %s", (analyte, basis, words) => {
    expect(basisUnit(analyte, basis)).toBe(words);
  });
});

describe("validateKit: each rule, its field, its words and its edge", () => {
  const steps = [0, 1, 2];
  it("a name is needed, up to 60 characters", () => {
    expect(validateKit({ name: "", steps })).toEqual([{ field: "name", message: "Give the kit a name your team will recognise." }]);
    expect(validateKit({ name: "x".repeat(60), steps })).toEqual([]);
    expect(validateKit({ name: "x".repeat(61), steps })).toEqual([{ field: "name", message: "Keep the name under 60 characters." }]);
  });
  it("from 2 to 12 steps", () => {
    const twelve = Array.from({ length: 12 }, (_, i) => i);
    expect(validateKit({ name: "A", steps: twelve })).toEqual([]);
    expect(validateKit({ name: "A", steps: [...twelve, 12] })).toEqual([{ field: "steps", message: "List between 2 and 12 steps, separated by commas." }]);
    expect(validateKit({ name: "A", steps: [0] })).toEqual([{ field: "steps", message: "List between 2 and 12 steps, separated by commas." }]);
  });
  it("each step from 0 to 500 mg/L", () => {
    const message = { field: "steps", message: "Each step must be a number from 0 to 500." };
    expect(validateKit({ name: "A", steps: [0, 500] })).toEqual([]);
    expect(validateKit({ name: "A", steps: [0, 501] })).toEqual([message]);
    expect(validateKit({ name: "A", steps: [-1, 0] })).toEqual([message]);
  });
  it("starting at 0 and rising, each step once", () => {
    expect(validateKit({ name: "A", steps: [1, 2] })).toEqual([{ field: "steps", message: "Start the steps at 0, the kit's lowest reading." }]);
    const order = { field: "steps", message: "List the steps from lowest to highest, each once." };
    expect(validateKit({ name: "A", steps: [0, 2, 1] })).toEqual([order]);
    expect(validateKit({ name: "A", steps: [0, 0] })).toEqual([order]);
  });
});

describe("parseSteps reads plain decimals only", () => {
  it("leading and trailing separators are ignored", () => {
    expect(parseSteps(" 0, 0.25 ; 10 ")).toEqual([0, 0.25, 10]);
  });
  it("anything but digits with an optional decimal part is a bad entry", () => {
    expect(parseSteps("-1")).toEqual([Number.NaN]);
    expect(parseSteps("1e3")).toEqual([Number.NaN]);
    expect(parseSteps("1.")).toEqual([Number.NaN]);
    expect(parseSteps("12.75")).toEqual([12.75]);
  });
});
