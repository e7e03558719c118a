import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { dateOnlyOrEmpty, dateTime, exactText, isCleanText, optionalText, text } from "@/lib/validation/text";

describe("text", () => {
  const field = text(20);

  it("trims and keeps ordinary text, accents and emoji", () => {
    expect(field.parse("  Reef 240  ")).toBe("Reef 240");
    expect(field.parse("Café 🐠")).toBe("Café 🐠");
  });

  it("refuses a NUL byte, other control characters and half a surrogate pair", () => {
    for (const bad of ["a\u0000b", "bell\u0007", "lone \ud800", "lone \udc00 low"]) {
      expect(field.safeParse(bad).success, JSON.stringify(bad)).toBe(false);
    }
    expect(field.safeParse("line 1\nline 2\ttab").success).toBe(true);
  });

  it("refuses text over the limit after trimming", () => {
    expect(field.safeParse("x".repeat(21)).success).toBe(false);
    expect(field.safeParse(`  ${"x".repeat(20)}  `).success).toBe(true);
  });

  const wide = text(100);
  // Any UTF-16 code units, lone surrogates and control characters included.
  const codeUnits = fc.array(fc.integer({ min: 0, max: 0xffff }), { maxLength: 30 }).map((a) => String.fromCharCode(...a));
  it("never lets through a string PostgreSQL or UTF-8 would refuse", () => {
    fc.assert(
      fc.property(codeUnits, (s) => {
        const r = wide.safeParse(s);
        if (r.success) expect(isCleanText(r.data) && !r.data.includes("\u0000")).toBe(true);
      }),
    );
  });

  it("turns an empty optional text into null and keeps exact text untrimmed", () => {
    expect(optionalText(10).parse("   ")).toBeNull();
    expect(optionalText(10).parse(undefined)).toBeNull();
    expect(exactText(10).parse(" pass ")).toBe(" pass ");
    expect(exactText(10).safeParse("p\u0000ss").success).toBe(false);
  });
});

describe("dates", () => {
  const when = dateTime("Enter a date.");

  it("reads datetime-local and ISO strings", () => {
    expect(when.parse("2026-03-04T10:15").getFullYear()).toBe(2026);
    expect(when.parse("2026-03-04T10:15:00Z").toISOString()).toBe("2026-03-04T10:15:00.000Z");
  });

  it("refuses year 1, a boolean, a bare number and the far future", () => {
    for (const bad of ["0001-01-01T00:00", true, false, 0, 1, "1", "9999-12-31T00:00", "+275760-09-13T00:00:00Z", ""]) {
      expect(when.safeParse(bad).success, JSON.stringify(bad)).toBe(false);
    }
  });

  it("keeps a calendar date as typed, or empty", () => {
    const d = dateOnlyOrEmpty();
    expect(d.parse("2027-05-01")).toBe("2027-05-01");
    expect(d.parse("")).toBe("");
    for (const bad of ["0001-01-01", "2027-02-30", "2027-5-1", "3000-01-01"]) expect(d.safeParse(bad).success, bad).toBe(false);
  });
});
