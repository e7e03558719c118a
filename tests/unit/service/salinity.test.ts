import { describe, expect, it } from "vitest";
import { validateReading } from "@/lib/cycling/readings";

const now = new Date("2027-03-02T12:00:00Z");
const base = { takenAt: now, ammoniaMgL: null, nitriteMgL: null, nitrateMgL: null, pH: null, tempC: null };

describe("salinity on a water test", () => {
  it("accepts sea-water readings", () => {
    // Natural sea water is about 35 ppt (UNESCO practical salinity scale).
    expect(validateReading({ ...base, salinityPpt: 35 }, now)).toEqual([]);
    expect(validateReading({ ...base, salinityPpt: 0 }, now)).toEqual([]);
    expect(validateReading({ ...base, salinityPpt: 45 }, now)).toEqual([]);
  });
  it("refuses a negative or unbelievable salinity with a sentence", () => {
    expect(validateReading({ ...base, salinityPpt: -1 }, now)).toEqual([{ field: "salinityPpt", message: "Salinity must be between 0 and 45 ppt (sea water is about 35)." }]);
    expect(validateReading({ ...base, salinityPpt: 1025 }, now)[0].field).toBe("salinityPpt");
  });
});
