import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  KG_PER_POUND,
  KPA_PER_PSF,
  LITRES_PER_US_GALLON,
  MM_PER_INCH,
  M_PER_FOOT,
  STANDARD_GRAVITY,
  celsiusToFahrenheit,
  fahrenheitToCelsius,
  fromDisplay,
  gallonsToLitres,
  inchesToMm,
  kgToPounds,
  kpaToPsf,
  litresToGallons,
  mmToInches,
  poundsToKg,
  psfToKpa,
  toDisplay,
  unitLabel,
  type QuantityKind,
  type UnitSystem,
} from "@/lib/tank/units";

describe("exact unit definitions", () => {
  it("inch, foot and pound match the 1959 international yard and pound agreement", () => {
    expect(MM_PER_INCH).toBe(25.4); // NIST Handbook 44, Appendix C: 1 in = 25.4 mm exactly (1959 agreement)
    expect(M_PER_FOOT).toBe(0.3048); // NIST Handbook 44, Appendix C: 1 ft = 0.3048 m exactly
    expect(KG_PER_POUND).toBe(0.45359237); // NIST Handbook 44, Appendix C: 1 lb = 0.45359237 kg exactly (1959 agreement)
  });

  it("US gallon is 231 cubic inches", () => {
    // NIST Handbook 44, Appendix C: 1 US gal = 231 in³ exactly; 1 in³ = 2.54³ cm³ = 16.387064 cm³
    const cubicInchLitres = (MM_PER_INCH ** 3) / 1e6;
    expect(231 * cubicInchLitres).toBeCloseTo(3.785411784, 12);
    expect(LITRES_PER_US_GALLON).toBe(3.785411784); // NIST Handbook 44, Appendix C: 1 gal = 3.785411784 L exactly
  });

  it("standard gravity is the CGPM value", () => {
    expect(STANDARD_GRAVITY).toBe(9.80665); // 3rd CGPM (1901): g₀ = 9.80665 m/s² exactly
  });

  it("1 psf is 0.0478802589803 kPa", () => {
    // NIST SP 811, Appendix B: 1 lbf/ft² = 4.788026 E+01 Pa; derived exactly as
    // 0.45359237 kg × 9.80665 m/s² / 0.09290304 m² = 47.8802589803… Pa
    expect(KPA_PER_PSF).toBeCloseTo(0.0478802589803, 13);
    expect(psfToKpa(40)).toBeCloseTo(1.915210359, 9); // 40 × 0.0478802589803 (IRC living-area live load in kPa)
  });
});

describe("single conversions", () => {
  it("length", () => {
    expect(inchesToMm(12)).toBeCloseTo(304.8, 12); // NIST Handbook 44: 1 ft = 12 in = 304.8 mm exactly
    expect(mmToInches(25.4)).toBe(1); // 1959 agreement: 1 in = 25.4 mm
  });

  it("mass", () => {
    expect(poundsToKg(100)).toBeCloseTo(45.359237, 12); // 100 × 0.45359237 kg (1959 agreement)
    expect(kgToPounds(0.45359237)).toBe(1); // 1959 agreement: 1 lb = 0.45359237 kg
  });

  it("volume", () => {
    expect(gallonsToLitres(55)).toBeCloseTo(208.19764812, 9); // 55 × 3.785411784 L (NIST Handbook 44)
    expect(litresToGallons(3.785411784)).toBe(1); // NIST Handbook 44: 1 gal = 3.785411784 L
  });

  it("temperature", () => {
    expect(celsiusToFahrenheit(0)).toBe(32); // NIST SP 811: ice point 0 °C = 32 °F
    expect(celsiusToFahrenheit(100)).toBe(212); // NIST SP 811: 100 °C = 212 °F
    expect(celsiusToFahrenheit(-40)).toBe(-40); // scales cross at −40 (from °F = °C × 9/5 + 32)
    expect(fahrenheitToCelsius(77)).toBe(25); // (77 − 32) × 5/9 = 25 (NIST SP 811 formula)
  });

  it("pressure", () => {
    expect(kpaToPsf(KPA_PER_PSF)).toBe(1);
    expect(kpaToPsf(1)).toBeCloseTo(20.885434233, 8); // 1 / 0.0478802589803 (derived above)
  });
});

describe("display helpers", () => {
  it("metric display is the stored SI value unchanged", () => {
    const kinds: QuantityKind[] = ["length", "mass", "volume", "temperature", "pressure", "flow"];
    for (const kind of kinds) {
      expect(toDisplay(kind, 123.456, "metric")).toBe(123.456);
      expect(fromDisplay(kind, 123.456, "metric")).toBe(123.456);
    }
  });

  it("imperial display converts each kind", () => {
    expect(toDisplay("length", 1800, "imperial")).toBeCloseTo(70.866142, 6); // 1800 / 25.4 (1959 agreement)
    expect(toDisplay("mass", 1000, "imperial")).toBeCloseTo(2204.622622, 6); // 1000 / 0.45359237 (1959 agreement)
    expect(toDisplay("volume", 1000, "imperial")).toBeCloseTo(264.172052, 6); // 1000 / 3.785411784 (NIST Handbook 44)
    expect(toDisplay("temperature", 25, "imperial")).toBe(77); // 25 × 9/5 + 32 (NIST SP 811)
    expect(toDisplay("pressure", psfToKpa(40), "imperial")).toBeCloseTo(40, 12);
    expect(toDisplay("flow", 37.85411784, "imperial")).toBeCloseTo(10, 12); // 10 gal/min × 3.785411784 L/gal
    expect(fromDisplay("length", 24, "imperial")).toBeCloseTo(609.6, 12); // 24 × 25.4 mm (1959 agreement)
    expect(fromDisplay("temperature", 78.8, "imperial")).toBeCloseTo(26, 12); // (78.8 − 32) × 5/9 (NIST SP 811)
  });

  it("labels", () => {
    expect(unitLabel("length", "metric")).toBe("mm");
    expect(unitLabel("length", "imperial")).toBe("in");
    expect(unitLabel("mass", "imperial")).toBe("lb");
    expect(unitLabel("volume", "metric")).toBe("L");
    expect(unitLabel("volume", "imperial")).toBe("gal");
    expect(unitLabel("temperature", "imperial")).toBe("°F");
    expect(unitLabel("pressure", "metric")).toBe("kPa");
    expect(unitLabel("pressure", "imperial")).toBe("psf");
    expect(unitLabel("flow", "imperial")).toBe("gal/min");
  });

  it("round trips are exact to floating-point tolerance", () => {
    const kinds = fc.constantFrom<QuantityKind>("length", "mass", "volume", "temperature", "pressure", "flow");
    const systems = fc.constantFrom<UnitSystem>("metric", "imperial");
    fc.assert(
      fc.property(kinds, systems, fc.double({ min: -1e6, max: 1e6, noNaN: true }), (kind, system, value) => {
        const back = fromDisplay(kind, toDisplay(kind, value, system), system);
        // Relative 1e-12, plus an absolute floor for values near zero (temperature offset of 32).
        expect(Math.abs(back - value)).toBeLessThanOrEqual(1e-12 * Math.abs(value) + 1e-9);
      }),
    );
  });
});
