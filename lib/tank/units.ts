/**
 * Unit conversions between the stored SI values and what a user reads on screen.
 *
 * Stored values are always SI-style: millimetres, kilograms, litres, degrees
 * Celsius, kilopascals, litres per minute. Imperial figures exist only at the
 * display edge, so every constant here is an exact definition rather than a
 * rounded factor: a round trip must not drift.
 */

/** 1959 international yard and pound agreement (NIST Handbook 44, Appendix C): 1 in = 25.4 mm exactly. */
export const MM_PER_INCH = 25.4;

/** 1959 international yard and pound agreement (NIST Handbook 44, Appendix C): 1 lb = 0.45359237 kg exactly. */
export const KG_PER_POUND = 0.45359237;

/** NIST Handbook 44, Appendix C: 1 ft = 0.3048 m exactly (12 in × 25.4 mm). */
export const M_PER_FOOT = 0.3048;

/**
 * NIST Handbook 44, Appendix C: 1 US gallon = 231 in³ exactly.
 * 231 × (2.54 cm)³ = 231 × 16.387064 cm³ = 3785.411784 cm³ = 3.785411784 L exactly.
 */
export const LITRES_PER_US_GALLON = 3.785411784;

/** 3rd CGPM (1901): standard acceleration of gravity g₀ = 9.80665 m/s² exactly. */
export const STANDARD_GRAVITY = 9.80665;

/**
 * kPa per lbf/ft², derived rather than typed in so it stays exact to double precision:
 * 1 lbf = 0.45359237 kg × 9.80665 m/s² = 4.4482216152605 N (NIST Handbook 44, Appendix C);
 * 1 ft² = 0.3048² m² = 0.09290304 m²; so 1 psf = 47.880258980… Pa = 0.0478802589803 kPa.
 */
export const KPA_PER_PSF = (KG_PER_POUND * STANDARD_GRAVITY) / (M_PER_FOOT * M_PER_FOOT) / 1000;

/** The user's preferred display system; storage is always metric/SI. */
export type UnitSystem = "metric" | "imperial";

/** The physical quantities the tank tools show to users. */
export type QuantityKind = "length" | "mass" | "volume" | "temperature" | "pressure" | "flow";

/** Millimetres to inches (NIST Handbook 44, Appendix C: 1 in = 25.4 mm). */
export function mmToInches(mm: number): number {
  return mm / MM_PER_INCH;
}

/** Inches to millimetres (NIST Handbook 44, Appendix C: 1 in = 25.4 mm). */
export function inchesToMm(inches: number): number {
  return inches * MM_PER_INCH;
}

/** Kilograms to pounds (1959 yard and pound agreement: 1 lb = 0.45359237 kg). */
export function kgToPounds(kg: number): number {
  return kg / KG_PER_POUND;
}

/** Pounds to kilograms (1959 yard and pound agreement: 1 lb = 0.45359237 kg). */
export function poundsToKg(pounds: number): number {
  return pounds * KG_PER_POUND;
}

/** Litres to US gallons (NIST Handbook 44, Appendix C: 1 gal = 231 in³ = 3.785411784 L). */
export function litresToGallons(litres: number): number {
  return litres / LITRES_PER_US_GALLON;
}

/** US gallons to litres (NIST Handbook 44, Appendix C: 1 gal = 231 in³ = 3.785411784 L). */
export function gallonsToLitres(gallons: number): number {
  return gallons * LITRES_PER_US_GALLON;
}

/** Kilopascals to pounds-force per square foot (see KPA_PER_PSF for the derivation). */
export function kpaToPsf(kpa: number): number {
  return kpa / KPA_PER_PSF;
}

/** Pounds-force per square foot to kilopascals (see KPA_PER_PSF for the derivation). */
export function psfToKpa(psf: number): number {
  return psf * KPA_PER_PSF;
}

/** Celsius to Fahrenheit: °F = °C × 9/5 + 32 (NIST SP 811, Guide for the Use of the SI, temperature conversion). */
export function celsiusToFahrenheit(celsius: number): number {
  return (celsius * 9) / 5 + 32;
}

/** Fahrenheit to Celsius: °C = (°F − 32) × 5/9 (NIST SP 811, Guide for the Use of the SI, temperature conversion). */
export function fahrenheitToCelsius(fahrenheit: number): number {
  return ((fahrenheit - 32) * 5) / 9;
}

/** Converts a stored SI value of the given kind into the user's display units. */
export function toDisplay(kind: QuantityKind, siValue: number, system: UnitSystem): number {
  if (system === "metric") return siValue;
  switch (kind) {
    case "length":
      return mmToInches(siValue);
    case "mass":
      return kgToPounds(siValue);
    case "volume":
      return litresToGallons(siValue);
    case "temperature":
      return celsiusToFahrenheit(siValue);
    case "pressure":
      return kpaToPsf(siValue);
    case "flow":
      // L/min → US gal/min: only the volume unit changes.
      return litresToGallons(siValue);
  }
}

/** Converts a value typed in the user's display units back into the stored SI value. */
export function fromDisplay(kind: QuantityKind, displayValue: number, system: UnitSystem): number {
  if (system === "metric") return displayValue;
  switch (kind) {
    case "length":
      return inchesToMm(displayValue);
    case "mass":
      return poundsToKg(displayValue);
    case "volume":
      return gallonsToLitres(displayValue);
    case "temperature":
      return fahrenheitToCelsius(displayValue);
    case "pressure":
      return psfToKpa(displayValue);
    case "flow":
      return gallonsToLitres(displayValue);
  }
}

const LABELS: Record<QuantityKind, Record<UnitSystem, string>> = {
  length: { metric: "mm", imperial: "in" },
  mass: { metric: "kg", imperial: "lb" },
  volume: { metric: "L", imperial: "gal" },
  temperature: { metric: "°C", imperial: "°F" },
  pressure: { metric: "kPa", imperial: "psf" },
  flow: { metric: "L/min", imperial: "gal/min" },
};

/** The short unit label shown beside a value of this kind in this system. */
export function unitLabel(kind: QuantityKind, system: UnitSystem): string {
  return LABELS[kind][system];
}
