import { describe, expect, it } from "vitest";
import { MAX_DIMENSION_MM, validateDesign, type TankDesign } from "@/lib/tank/design";
import { demoDesign } from "./fixtures";

function fieldsOf(design: TankDesign): string[] {
  return validateDesign(design).map((p) => p.field);
}

describe("validateDesign", () => {
  it("accepts the demo design", () => {
    expect(validateDesign(demoDesign())).toEqual([]);
  });

  it("rejects zero and negative sizes", () => {
    expect(fieldsOf({ ...demoDesign(), lengthMm: 0 })).toContain("lengthMm");
    expect(fieldsOf({ ...demoDesign(), widthMm: -600 })).toContain("widthMm");
    expect(fieldsOf({ ...demoDesign(), heightMm: 0 })).toContain("heightMm");
    expect(fieldsOf({ ...demoDesign(), panelThicknessMm: 0 })).toContain("panelThicknessMm");
    expect(fieldsOf({ ...demoDesign(), rockMassKg: -1 })).toEqual(["rockMassKg"]);
    expect(fieldsOf({ ...demoDesign(), sumpVolumeL: -5 })).toEqual(["sumpVolumeL"]);
  });

  it("says what is wrong in plain words", () => {
    const [problem] = validateDesign({ ...demoDesign(), lengthMm: 0 });
    expect(problem).toEqual({ field: "lengthMm", message: "Length must be more than zero." });
  });

  it("rejects a value that isn't a number", () => {
    expect(fieldsOf({ ...demoDesign(), heightMm: Number.NaN })).toEqual(["heightMm"]);
  });

  it("rejects water at or above the rim", () => {
    expect(fieldsOf({ ...demoDesign(), waterBelowRimMm: 0 })).toEqual(["waterBelowRimMm"]);
    expect(fieldsOf({ ...demoDesign(), waterBelowRimMm: -20 })).toEqual(["waterBelowRimMm"]);
  });

  it("rejects a water level at or below the bottom", () => {
    // internal height 700 − 15 = 685 mm; 685 mm below the rim leaves no water
    expect(fieldsOf({ ...demoDesign(), waterBelowRimMm: 685 })).toEqual(["waterBelowRimMm"]);
  });

  it("rejects panels too thick for the tank", () => {
    // half the 600 mm width is 300 mm: at 300 mm there is no inside left
    expect(fieldsOf({ ...demoDesign(), panelThicknessMm: 300 })).toEqual(["panelThicknessMm"]);
    expect(fieldsOf({ ...demoDesign(), panelThicknessMm: 299 })).toEqual([]);
    expect(fieldsOf({ ...demoDesign(), bottomThicknessMm: 700 })).toEqual(["bottomThicknessMm"]);
  });

  it("rejects a tank over 10 m", () => {
    expect(MAX_DIMENSION_MM).toBe(10000); // our own cut-off, see design.ts
    const big = { ...demoDesign(), lengthMm: 10001 };
    big.stand = { ...big.stand, lengthMm: 10001 };
    const problems = validateDesign(big);
    // the stand grew with it, so both are flagged
    expect(problems.map((p) => p.field)).toEqual(["lengthMm", "stand.lengthMm"]);
    expect(problems[0].message).toBe("Length is over 10 m. Check the units: sizes are in millimetres.");
  });

  it("rejects substrate deeper than the water", () => {
    // water height 635 mm (700 − 15 − 50)
    expect(fieldsOf({ ...demoDesign(), substrate: { type: "sand", depthMm: 635 } })).toEqual(["substrate.depthMm"]);
    expect(fieldsOf({ ...demoDesign(), substrate: { type: "sand", depthMm: 634 } })).toEqual([]);
    // "none" ignores a leftover depth
    expect(fieldsOf({ ...demoDesign(), substrate: { type: "none", depthMm: 900 } })).toEqual([]);
  });

  it("rejects temperatures outside the density formulas' range", () => {
    // Tanaka 2001 covers 0–40 °C
    expect(fieldsOf({ ...demoDesign(), temperatureC: 45 })).toEqual(["temperatureC"]);
    expect(fieldsOf({ ...demoDesign(), temperatureC: -1 })).toEqual(["temperatureC"]);
  });

  it("rejects salinity outside EOS-80's range", () => {
    // Millero & Poisson 1981: 0–42 psu
    expect(fieldsOf({ ...demoDesign(), water: "salt", salinityPsu: 50 })).toEqual(["salinityPsu"]);
    expect(fieldsOf({ ...demoDesign(), water: "salt", salinityPsu: 35 })).toEqual([]);
  });

  it("checks a bowfront's bow", () => {
    const d = demoDesign();
    const bow: TankDesign = { ...d, shape: "bowfront", lengthMm: 1200, widthMm: 500, bowDepthMm: 150, heightMm: 600 };
    // the bow makes the tank 650 mm deep at the centre: the 600 mm stand is too shallow
    expect(fieldsOf(bow)).toEqual(["stand"]);
    bow.stand = { ...d.stand, widthMm: 650 };
    expect(fieldsOf(bow)).toEqual([]);
    expect(fieldsOf({ ...bow, bowDepthMm: 0 })).toEqual(["bowDepthMm"]);
    expect(fieldsOf({ ...bow, bowDepthMm: 601 })).toContain("bowDepthMm");
  });

  it("checks a cylinder's diameter and wall", () => {
    const cyl: TankDesign = { ...demoDesign(), shape: "cylinder", diameterMm: 600, heightMm: 1000 };
    expect(fieldsOf(cyl)).toEqual([]);
    expect(fieldsOf({ ...cyl, diameterMm: -1 })).toEqual(["diameterMm"]);
    expect(fieldsOf({ ...cyl, panelThicknessMm: 300 })).toEqual(["panelThicknessMm"]);
  });

  it("checks the stand", () => {
    const d = demoDesign();
    expect(fieldsOf({ ...d, stand: { ...d.stand, lengthMm: 1500 } })).toEqual(["stand.footprint", "stand"]);
    expect(fieldsOf({ ...d, stand: { ...d.stand, massKg: -3 } })).toEqual(["stand.massKg"]);
    const legs = { kind: "legs", count: 2.5, legLengthMm: 100, legWidthMm: 100 } as const;
    expect(fieldsOf({ ...d, stand: { ...d.stand, footprint: legs } })).toEqual(["stand.footprint.count"]);
    expect(fieldsOf({ ...d, stand: { ...d.stand, footprint: { ...legs, count: 6, legWidthMm: 0 } } })).toEqual([
      "stand.footprint.legWidthMm",
    ]);
  });

  it("reports several problems at once", () => {
    const fields = fieldsOf({ ...demoDesign(), lengthMm: 0, heightMm: -5, waterBelowRimMm: 0 });
    expect(fields).toEqual(expect.arrayContaining(["lengthMm", "heightMm", "waterBelowRimMm"]));
  });
});

describe("validateDesign: the ends of the water ranges are inclusive", () => {
  it("takes 0 °C and 40 °C (the range Tanaka et al. 2001 and EOS-80 cover) and refuses just outside", () => {
    expect(fieldsOf({ ...demoDesign(), temperatureC: 0 })).toEqual([]);
    expect(fieldsOf({ ...demoDesign(), temperatureC: 40 })).toEqual([]);
    expect(fieldsOf({ ...demoDesign(), temperatureC: -0.1 })).toEqual(["temperatureC"]);
    expect(validateDesign({ ...demoDesign(), temperatureC: 40.1 })).toEqual([
      { field: "temperatureC", message: "Water temperature must be between 0 °C and 40 °C." },
    ]);
  });

  it("takes salinity from 0 to 42 psu (EOS-80's one-atmosphere range, Millero & Poisson 1981) and refuses just outside", () => {
    expect(fieldsOf({ ...demoDesign(), water: "salt", salinityPsu: 0 })).toEqual([]);
    expect(fieldsOf({ ...demoDesign(), water: "salt", salinityPsu: 42 })).toEqual([]);
    expect(fieldsOf({ ...demoDesign(), water: "salt", salinityPsu: -0.1 })).toEqual(["salinityPsu"]);
    expect(validateDesign({ ...demoDesign(), water: "salt", salinityPsu: 42.1 })).toEqual([
      { field: "salinityPsu", message: "Salinity must be between 0 and 42 psu (natural seawater is about 35)." },
    ]);
  });
});
