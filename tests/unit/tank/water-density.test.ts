import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  DEFAULT_REEF_SALINITY_PSU,
  freshWaterDensity,
  seawaterDensity,
  specificGravity,
  waterDensity,
} from "@/lib/tank/water-density";

describe("freshWaterDensity (Tanaka et al. 2001)", () => {
  // Tanaka, Girard, Davis, Peuto & Bignell (2001), Metrologia 38:301, Table 1 (recommended
  // density of SMOW, kg/m³; table values from memory, printed to 0.0001 kg/m³). The table
  // was generated from the same formula, so agreement within 0.001 kg/m³ is expected.
  const table: Array<[tempC: number, rho: number]> = [
    [0, 999.8428], // Tanaka 2001 table, 0 °C
    [4, 999.975], // Tanaka 2001 table, 4 °C (the maximum, at 3.983 °C, is a5 = 999.97495)
    [10, 999.7026], // Tanaka 2001 table, 10 °C
    [20, 998.2067], // Tanaka 2001 table, 20 °C
    [25, 997.047], // Tanaka 2001 table, 25 °C
    [30, 995.6488], // Tanaka 2001 table, 30 °C
    [40, 992.2152], // Tanaka 2001 table, 40 °C
  ];
  it.each(table)("at %d °C matches the table value %d kg/m³", (tempC, rho) => {
    expect(Math.abs(freshWaterDensity(tempC) - rho)).toBeLessThan(0.001);
  });

  it("peaks at 999.97495 kg/m³ near 3.98 °C", () => {
    // Tanaka 2001, eq. (1): ρ = a5 at t = −a1 = 3.983035 °C, a5 = 999.974950 kg/m³
    expect(freshWaterDensity(3.983035)).toBeCloseTo(999.97495, 9);
    expect(freshWaterDensity(3.983035)).toBeGreaterThan(freshWaterDensity(3));
    expect(freshWaterDensity(3.983035)).toBeGreaterThan(freshWaterDensity(5));
  });

  it("worked by hand from Tanaka et al. (2001) eq. (1) at 40 °C, where every coefficient shows", () => {
    // a5 · (1 − (40 − 3.983035)² · (40 + 301.797) / (522528.9 · (40 + 69.34881)))
    //   = 999.97495 · (1 − 1297.22177 · 341.797 / 57137913.41) = 999.97495 · (1 − 0.00775994) = 992.215209 kg/m³
    expect(freshWaterDensity(40)).toBeCloseTo(992.215209, 6);
  });

  it("peaks at 3.983035 °C to the fourth decimal place (Tanaka 2001, eq. (1): a1 = −3.983035 °C)", () => {
    expect(freshWaterDensity(3.983035)).toBeGreaterThan(freshWaterDensity(3.983035 + 1e-4));
    expect(freshWaterDensity(3.983035)).toBeGreaterThan(freshWaterDensity(3.983035 - 1e-4));
  });

  it("falls steadily across aquarium temperatures (property)", () => {
    fc.assert(
      fc.property(fc.double({ min: 4, max: 39, noNaN: true }), (t) => {
        expect(freshWaterDensity(t + 1)).toBeLessThan(freshWaterDensity(t));
      }),
    );
  });
});

describe("seawaterDensity (EOS-80, Millero & Poisson 1981)", () => {
  // The EOS-80 check values are on the IPTS-68 scale; t90 = t68 / 1.00024 (Saunders 1990)
  // feeds the polynomial exactly t68.
  const at68 = (t68: number) => t68 / 1.00024;

  it("reproduces the UNESCO check value at S = 35, t = 25 °C", () => {
    // Fofonoff & Millard (1983), UNESCO Technical Papers in Marine Science 44: ρ(35, 25, 0) = 1023.343 kg/m³
    expect(seawaterDensity(at68(25), 35)).toBeCloseTo(1023.343, 3);
  });

  it("reproduces the other one-atmosphere check values", () => {
    // Millero & Poisson (1981) / UNESCO 44 check values (from memory): ρ(35, 5, 0) = 1027.67547,
    // ρ(0, 5, 0) = 999.96675, ρ(0, 25, 0) = 997.04796 kg/m³
    expect(seawaterDensity(at68(5), 35)).toBeCloseTo(1027.67547, 4);
    expect(seawaterDensity(at68(5), 0)).toBeCloseTo(999.96675, 4);
    expect(seawaterDensity(at68(25), 0)).toBeCloseTo(997.04796, 4);
  });

  it("uses 35 psu by default, about 1023.3 kg/m³ at 25 °C", () => {
    expect(DEFAULT_REEF_SALINITY_PSU).toBe(35); // common practice reef salinity
    // ITS-90 25 °C is IPTS-68 25.006 °C; at ∂ρ/∂t ≈ −0.30 kg/m³ per K (EOS-80 at S = 35, 25 °C)
    // that lowers the UNESCO 44 check value 1023.34306 by ~0.0018, to 1023.3412 kg/m³.
    expect(seawaterDensity(25)).toBeCloseTo(1023.3412, 3);
  });

  it("gives reef specific gravity about 1.026", () => {
    // 1023.34 / 997.05 = 1.0264; 1.026 is the common practice reef figure
    expect(specificGravity(25)).toBeCloseTo(1.0264, 4);
  });

  it("grows with salinity (property)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 40, noNaN: true }),
        fc.double({ min: 0, max: 40, noNaN: true }),
        (t, s) => {
          expect(seawaterDensity(t, s + 1)).toBeGreaterThan(seawaterDensity(t, s));
        },
      ),
    );
  });

  it("at zero salinity agrees with the fresh-water formula to within 0.005 kg/m³", () => {
    // EOS-80's SMOW polynomial and Tanaka's CIPM formula differ by a few thousandths
    // (different data sets and temperature scales); either is far finer than we need.
    for (const t of [5, 15, 25, 35]) {
      expect(Math.abs(seawaterDensity(t, 0) - freshWaterDensity(t))).toBeLessThan(0.005);
    }
  });
});

describe("waterDensity", () => {
  it("picks the formula by water kind", () => {
    expect(waterDensity("fresh", 25)).toBe(freshWaterDensity(25));
    expect(waterDensity("salt", 25)).toBe(seawaterDensity(25, 35));
    expect(waterDensity("salt", 25, 30)).toBe(seawaterDensity(25, 30));
  });
});
