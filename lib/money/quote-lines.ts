import { computeLoad } from "../tank/load";
import { panelDensityKgM3 } from "../tank/densities";
import type { TankDesign } from "../tank/design";

/** The groups a quote's lines fall into, in the order they are shown. */
export const QUOTE_GROUPS = ["tank_glass", "stand_cabinet", "filtration_equipment", "lighting", "aquascape_materials", "livestock", "labour"] as const;
export type QuoteGroup = (typeof QUOTE_GROUPS)[number];

export const QUOTE_GROUP_LABELS: Record<QuoteGroup, string> = {
  tank_glass: "Tank and glass",
  stand_cabinet: "Stand and cabinet",
  filtration_equipment: "Filtration and equipment",
  lighting: "Lighting",
  aquascape_materials: "Aquascape materials",
  livestock: "Livestock",
  labour: "Labour",
};

/**
 * What a price-list item's quantity comes from when a quote is drafted from the design:
 * the panels' area, the substrate's or rock's mass, the water volume, one per quote, or nothing
 * (the lead adds it by hand).
 */
export const PRICE_BASES = ["glass_area_m2", "substrate_kg", "rock_kg", "net_volume_l", "per_quote", "manual"] as const;
export type PriceBasis = (typeof PRICE_BASES)[number];

export const PRICE_BASIS_LABELS: Record<PriceBasis, string> = {
  glass_area_m2: "panel area from the design (m²)",
  substrate_kg: "substrate mass from the design (kg)",
  rock_kg: "rock mass from the design (kg)",
  net_volume_l: "water volume from the design (L)",
  per_quote: "one on every quote",
  manual: "added by hand",
};

export type PriceItem = {
  id: string;
  group: QuoteGroup;
  label: string;
  unit: string;
  unitPriceMinor: number;
  taxBp: number;
  basis: PriceBasis;
  /** For glass: the panel thickness this price is for; null for any. */
  panelThicknessMm: number | null;
};

export type DraftLine = {
  group: QuoteGroup;
  description: string;
  unit: string;
  quantityMilli: number;
  unitPriceMinor: number;
  discountBp: number;
  taxBp: number;
  priceItemId: string | null;
};

/** The quantities the design knows, in the price list's units. */
export function designQuantities(design: TankDesign): { glassAreaM2: number; substrateKg: number; rockKg: number; netVolumeL: number; panelThicknessMm: number } {
  const load = computeLoad(design);
  // Panel area ≈ panel volume ÷ thickness; lib/tank/load's panel mass is that volume × the material's density.
  const panelVolumeM3 = load.glassMassKg / panelDensityKgM3(design.panelMaterial);
  const glassAreaM2 = design.panelThicknessMm > 0 ? panelVolumeM3 / (design.panelThicknessMm / 1000) : 0;
  return { glassAreaM2, substrateKg: load.substrateMassKg, rockKg: design.rockMassKg, netVolumeL: load.netVolumeL, panelThicknessMm: design.panelThicknessMm };
}

const toMilli = (x: number) => Math.max(0, Math.round(x * 1000));

/**
 * A first draft of a quote's lines: every price-list item whose quantity the design knows, plus
 * the items charged once per quote. Without a design only the per-quote items are drafted.
 */
export function draftLinesFromDesign(items: PriceItem[], design: TankDesign | null): DraftLine[] {
  const q = design ? designQuantities(design) : null;
  const lines: DraftLine[] = [];
  for (const item of items) {
    let qty: number | null = null;
    switch (item.basis) {
      case "per_quote":
        qty = 1;
        break;
      case "glass_area_m2":
        if (q && (item.panelThicknessMm === null || item.panelThicknessMm === q.panelThicknessMm)) qty = Math.round(q.glassAreaM2 * 100) / 100;
        break;
      case "substrate_kg":
        if (q && q.substrateKg > 0) qty = Math.ceil(q.substrateKg);
        break;
      case "rock_kg":
        if (q && q.rockKg > 0) qty = Math.ceil(q.rockKg);
        break;
      case "net_volume_l":
        if (q) qty = Math.round(q.netVolumeL);
        break;
      // Stryker disable next-line ConditionalExpression,StringLiteral: a hand-priced item is left out with or without its own case
      case "manual":
        break;
    }
    if (qty === null) continue;
    lines.push({ group: item.group, description: item.label, unit: item.unit, quantityMilli: toMilli(qty), unitPriceMinor: item.unitPriceMinor, discountBp: 0, taxBp: item.taxBp, priceItemId: item.id });
  }
  return lines.sort((a, b) => QUOTE_GROUPS.indexOf(a.group) - QUOTE_GROUPS.indexOf(b.group));
}
