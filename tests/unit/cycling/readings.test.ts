import { describe, expect, it } from "vitest";
import { kitSteps, validateReading, type ReadingInput } from "@/lib/cycling/readings";

const now = new Date("2025-03-10T12:00:00Z");

function input(values: Partial<ReadingInput> = {}): ReadingInput {
  return {
    takenAt: new Date("2025-03-10T11:00:00Z"),
    ammoniaMgL: 0.5,
    nitriteMgL: 0.25,
    nitrateMgL: 10,
    pH: 7.6,
    tempC: 25,
    khDkh: 6,
    ...values,
  };
}

const fields = (values: Partial<ReadingInput>) => validateReading(input(values), now).map((p) => p.field);

describe("validateReading", () => {
  it("accepts a normal reading, zeros and untested values", () => {
    expect(validateReading(input(), now)).toEqual([]);
    expect(validateReading(input({ ammoniaMgL: 0, nitriteMgL: 0, nitrateMgL: 0, khDkh: 0 }), now)).toEqual([]);
    expect(validateReading(input({ ammoniaMgL: null, pH: null, tempC: null, khDkh: undefined }), now)).toEqual([]);
  });

  it("rejects negative amounts in plain words", () => {
    expect(validateReading(input({ ammoniaMgL: -0.25 }), now)).toEqual([
      { field: "ammoniaMgL", message: "Ammonia can't be below zero." },
    ]);
    expect(fields({ nitriteMgL: -1, nitrateMgL: -5, khDkh: -1 })).toEqual(["nitriteMgL", "nitrateMgL", "khDkh"]);
  });

  it("rejects implausibly high amounts, keeping the limits inclusive", () => {
    expect(fields({ ammoniaMgL: 50, nitriteMgL: 50, nitrateMgL: 500, khDkh: 30 })).toEqual([]);
    expect(fields({ ammoniaMgL: 50.1, nitriteMgL: 51, nitrateMgL: 501, khDkh: 31 })).toEqual([
      "ammoniaMgL",
      "nitriteMgL",
      "nitrateMgL",
      "khDkh",
    ]);
    expect(validateReading(input({ nitriteMgL: 80 }), now)[0].message).toBe(
      "Nitrite above 50 mg/L isn't a believable test result; check the units and the decimal point.",
    );
  });

  it("rejects pH outside 0–14 and temperature outside 0–40 °C", () => {
    expect(fields({ pH: 14.5 })).toEqual(["pH"]);
    expect(fields({ pH: -1 })).toEqual(["pH"]);
    expect(fields({ tempC: -2 })).toEqual(["tempC"]);
    expect(fields({ tempC: 41 })).toEqual(["tempC"]);
    expect(fields({ pH: Number.NaN, ammoniaMgL: Number.NaN })).toEqual(["ammoniaMgL", "pH"]);
  });

  it("rejects a time more than 5 minutes ahead of now, and an invalid time", () => {
    expect(fields({ takenAt: new Date("2025-03-10T12:05:00Z") })).toEqual([]);
    expect(validateReading(input({ takenAt: new Date("2025-03-10T12:06:00Z") }), now)).toEqual([
      { field: "takenAt", message: "The test time is in the future; check the date and time." },
    ]);
    expect(fields({ takenAt: new Date("not a date") })).toEqual(["takenAt"]);
  });
});

describe("kitSteps", () => {
  it("starts every analyte at zero and rises step by step (common practice)", () => {
    for (const steps of Object.values(kitSteps)) {
      expect(steps[0]).toBe(0);
      expect([...steps].sort((a, b) => a - b)).toEqual(steps);
    }
  });
});
