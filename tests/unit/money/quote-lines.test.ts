import { describe, expect, it } from "vitest";
import { designQuantities, draftLinesFromDesign, type PriceItem } from "@/lib/money/quote-lines";
import { canonicalQuoteText, type QuoteView } from "@/lib/money/quote-view";
import { demoDesign } from "../tank/fixtures";

const item = (o: Partial<PriceItem>): PriceItem => ({ id: crypto.randomUUID(), group: "labour", label: "x", unit: "each", unitPriceMinor: 100, taxBp: 2000, basis: "manual", panelThicknessMm: null, ...o });

describe("drafting a quote from the design", () => {
  it("takes the panels' area from the design (bottom, two long and two short walls, cut to fit)", () => {
    // 1800 × 600 × 700 mm, 15 mm panels: bottom 1.8 × 0.6 = 1.08 m², long walls 2 × 1.8 × 0.685 = 2.466 m²,
    // short walls between them 2 × 0.57 × 0.685 = 0.7809 m²; 4.3269 m² in all (worked by hand).
    expect(designQuantities(demoDesign()).glassAreaM2).toBeCloseTo(4.3269, 4);
    expect(designQuantities(demoDesign()).rockKg).toBe(40);
  });

  it("prefills glass at the design's thickness, substrate and rock by mass, per-quote items, and leaves hand items out", () => {
    const items = [
      item({ group: "tank_glass", basis: "glass_area_m2", panelThicknessMm: 12, label: "12 mm" }),
      item({ group: "tank_glass", basis: "glass_area_m2", panelThicknessMm: 15, label: "15 mm" }),
      item({ group: "aquascape_materials", basis: "substrate_kg", label: "sand" }),
      item({ group: "aquascape_materials", basis: "rock_kg", label: "rock" }),
      item({ group: "stand_cabinet", basis: "per_quote", label: "stand" }),
      item({ group: "livestock", basis: "manual", label: "fish" }),
    ];
    const lines = draftLinesFromDesign(items, demoDesign());
    expect(lines.map((l) => l.description)).toEqual(["15 mm", "stand", "sand", "rock"]);
    expect(lines[0].quantityMilli).toBe(4330);
    expect(lines[3].quantityMilli).toBe(40_000);
    expect(lines.every((l) => l.priceItemId)).toBe(true);
    expect(draftLinesFromDesign(items, null).map((l) => l.description)).toEqual(["stand"]);
  });
});

describe("the accepted quote's fingerprint text", () => {
  const view: QuoteView = {
    quoteId: "q",
    projectTitle: "P",
    companyName: "C",
    version: 1,
    currency: "GBP",
    issuedAt: "2026-12-01T00:00:00.000Z",
    notes: "",
    lines: [{ group: "labour", description: "Crew", unit: "hour", quantityMilli: 1000, unitPriceMinor: 100, discountBp: 0, taxBp: 2000, netMinor: 100, taxMinor: 20, totalMinor: 120 }],
    netMinor: 100,
    taxMinor: 20,
    totalMinor: 120,
  };
  it("is stable for the same quote and changes with any figure or word", () => {
    expect(canonicalQuoteText(view)).toBe(canonicalQuoteText(structuredClone(view)));
    expect(canonicalQuoteText({ ...view, totalMinor: 121 })).not.toBe(canonicalQuoteText(view));
    expect(canonicalQuoteText({ ...view, lines: [{ ...view.lines[0], description: "Crew!" }] })).not.toBe(canonicalQuoteText(view));
    expect(canonicalQuoteText({ ...view, version: 2 })).not.toBe(canonicalQuoteText(view));
  });
});
