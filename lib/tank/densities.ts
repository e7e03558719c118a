/**
 * Material densities and substrate properties used for weights and displacement.
 * Each figure carries how sure we are of it, because installers will quote the
 * resulting weights to customers and floor engineers.
 */

import type { PanelMaterial, SubstrateType } from "./design";

/**
 * Soda-lime silicate float glass: 2500 kg/m³ (EN 572-1, Glass in building: basic
 * soda lime silicate glass products, definitions and general physical and mechanical
 * properties). Low-iron glass is the same soda-lime family with less iron oxide,
 * so it takes the same figure.
 */
export const SODA_LIME_GLASS_DENSITY_KG_M3 = 2500;

/** Cast acrylic (PMMA) sheet: about 1190 kg/m³ (from memory; typical sheet makers' data sheets). */
export const ACRYLIC_DENSITY_KG_M3 = 1190;

/**
 * Solid stone (limestone, granite and similar): about 2600 kg/m³ (from memory;
 * general engineering tables give roughly 2500–2700). Only the rock's displacement
 * depends on it: the rock's mass is entered directly. Porous reef rock's mineral
 * is a little denser, so this slightly overstates displacement; for 40 kg of rock
 * the difference is under 2 L of water.
 */
export const ROCK_DENSITY_KG_M3 = 2600;

/** Density of the panel material, kg/m³. */
export function panelDensityKgM3(material: PanelMaterial): number {
  return material === "acrylic" ? ACRYLIC_DENSITY_KG_M3 : SODA_LIME_GLASS_DENSITY_KG_M3;
}

/** Dry bulk density and pore fraction of a substrate bed. */
export interface SubstrateProperties {
  /** Mass of a loose bed per unit of bed volume, kg/m³ (what a bag of it weighs per litre). */
  bulkDensityKgM3: number;
  /** Fraction of the bed's volume that is gaps between grains and fills with water. */
  porosity: number;
}

/**
 * Typical substrate properties. Bulk densities: sand ~1600 kg/m³, gravel ~1500 kg/m³,
 * aqua soil ~1000 kg/m³ (common practice / from memory; bag labels vary by ±15 %).
 * Porosity 0.4 for sand and gravel (common practice; loose granular beds are
 * typically 0.35–0.45) and 0.5 for baked-clay aqua soils, whose grains are
 * themselves porous (common practice, from memory).
 */
export const SUBSTRATE_PROPERTIES: Record<SubstrateType, SubstrateProperties> = {
  sand: { bulkDensityKgM3: 1600, porosity: 0.4 },
  gravel: { bulkDensityKgM3: 1500, porosity: 0.4 },
  "aqua soil": { bulkDensityKgM3: 1000, porosity: 0.5 },
  none: { bulkDensityKgM3: 0, porosity: 1 },
};
