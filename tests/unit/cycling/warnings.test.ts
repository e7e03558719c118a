import { describe, expect, it } from "vitest";
import { readingWarnings, stallWarning, WARNING_THRESHOLDS, type WarningReading } from "@/lib/cycling/warnings";
import { at, reading } from "./cycle-fixtures";

function test(values: Partial<WarningReading>): WarningReading {
  return { ammoniaMgL: 0, nitriteMgL: 0, pH: 7.6, tempC: 25, khDkh: 6, ...values };
}

const fish = { fishPresent: true };
const noFish = { fishPresent: false };

describe("readingWarnings: free ammonia with fish", () => {
  // Fractions from Emerson et al. (1975), computed: 25 °C pH 8.0 → 0.05366; 25 °C pH 7.0 → 0.005639.
  // Thresholds 0.02 / 0.05 mg/L NH3: common practice, from memory (see WARNING_THRESHOLDS).

  it("is a caution at 0.5 mg/L total, pH 8.0, 25 °C: 0.5 × 0.05366 = 0.027 mg/L NH3", () => {
    const warnings = readingWarnings(test({ ammoniaMgL: 0.5, pH: 8.0 }), fish);
    expect(warnings).toHaveLength(1);
    expect(warnings[0]).toMatchObject({ level: "caution", code: "free-ammonia" });
    expect(warnings[0].message).toContain("about 0.027 mg/L NH3 at pH 8 and 25 °C");
  });

  it("is a danger at 1 mg/L total, pH 8.0, 25 °C: 1 × 0.05366 = 0.054 mg/L NH3", () => {
    const warnings = readingWarnings(test({ ammoniaMgL: 1, pH: 8.0 }), fish);
    expect(warnings).toMatchObject([{ level: "danger", code: "free-ammonia" }]);
  });

  it("is silent at 1 mg/L total, pH 7.0, 25 °C: 1 × 0.005639 = 0.0056 mg/L NH3", () => {
    expect(readingWarnings(test({ ammoniaMgL: 1, pH: 7.0 }), fish)).toEqual([]);
  });

  it("is silent without fish: a fishless cycle runs ammonia high on purpose", () => {
    expect(readingWarnings(test({ ammoniaMgL: 4, nitriteMgL: 5, pH: 8.2 }), noFish)).toEqual([]);
  });

  it("asks for pH and temperature when it can't work out the toxic share", () => {
    const warnings = readingWarnings(test({ ammoniaMgL: 0.5, tempC: null }), fish);
    expect(warnings).toEqual([
      {
        level: "caution",
        code: "ammonia-share-unknown",
        message:
          "Ammonia reads 0.5 mg/L with fish in the water; add pH and temperature to see how much of it is the toxic form.",
      },
    ]);
  });
});

describe("readingWarnings: nitrite, pH and KH", () => {
  it("flags nitrite from 0.5 mg/L with fish (common practice)", () => {
    expect(WARNING_THRESHOLDS.nitriteDangerMgL).toBe(0.5);
    expect(readingWarnings(test({ nitriteMgL: 0.5 }), fish)).toMatchObject([{ level: "danger", code: "nitrite" }]);
    expect(readingWarnings(test({ nitriteMgL: 0.25 }), fish)).toEqual([]);
    expect(readingWarnings(test({ nitriteMgL: 2 }), noFish)).toEqual([]);
  });

  it("warns below pH 6.5 and below 2 dKH, fish or not (common practice)", () => {
    expect(readingWarnings(test({ pH: 6.4 }), noFish)).toMatchObject([{ level: "caution", code: "low-ph" }]);
    expect(readingWarnings(test({ pH: 6.5 }), noFish)).toEqual([]);
    expect(readingWarnings(test({ khDkh: 1.5 }), noFish)).toEqual([
      { level: "caution", code: "low-kh", message: "KH is 1.5 dKH: too little buffer, so pH can drop and stall the cycle." },
    ]);
    expect(readingWarnings(test({ khDkh: 2 }), noFish)).toEqual([]);
  });

  it("gives nothing for a voided reading", () => {
    expect(readingWarnings(test({ nitriteMgL: 5, pH: 6, voided: true }), fish)).toEqual([]);
  });
});

describe("stallWarning", () => {
  const flat = (days: number) =>
    Array.from({ length: days + 1 }, (_, d) => reading(at(d), { ammoniaMgL: 0, nitriteMgL: 5 }));

  it("warns after ten days without change", () => {
    expect(stallWarning(flat(11).reverse(), at(11, 1))).toEqual({
      level: "caution",
      code: "stall",
      message: "Ammonia and nitrite haven't changed in 10 days: the cycle may have stalled. Check pH, KH and temperature.",
    });
  });

  it("stays quiet while things move or the history is short", () => {
    expect(stallWarning(flat(8), at(8, 1))).toBeNull();
    const moving = flat(11);
    moving[9] = reading(at(9), { ammoniaMgL: 0, nitriteMgL: 2 });
    expect(stallWarning(moving, at(11, 1))).toBeNull();
  });

  it("uses the company's smallest change that counts as progress", () => {
    const drifting = flat(11);
    drifting[9] = reading(at(9), { ammoniaMgL: 0, nitriteMgL: 4 });
    // A 1 mg/L drop counts as progress under the default 0.25 mg/L, but not under a 2 mg/L rule.
    expect(stallWarning(drifting, at(11, 1))).toBeNull();
    expect(stallWarning(drifting, at(11, 1), 10, 2)?.code).toBe("stall");
  });
});

describe("readingWarnings: edges of the inputs", () => {
  it("pH 0 is inside the range the free-ammonia formula takes: no 'add pH' caution, only low pH", () => {
    expect(readingWarnings(test({ ammoniaMgL: 1, pH: 0 }), fish)).toEqual([
      {
        level: "caution",
        code: "low-ph",
        message: "pH is 0: the bacteria slow down a lot below about 6.5, so the cycle may stall.",
      },
    ]);
  });

  it("an untested KH (null) gives no low-KH caution", () => {
    expect(readingWarnings(test({ khDkh: null }), noFish)).toEqual([]);
  });

  it("untested ammonia and nitrite give nothing, even with fish", () => {
    expect(readingWarnings(test({ ammoniaMgL: null, nitriteMgL: null }), fish)).toEqual([]);
  });
});
