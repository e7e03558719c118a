/**
 * Volumes, weights and floor loads of an installed tank. These figures go to
 * customers and to the people checking their floors, so every part of the total
 * is returned separately and can be traced back to an input.
 */

import type { TankDesign } from "./design";
import {
  ROCK_DENSITY_KG_M3,
  SUBSTRATE_PROPERTIES,
  panelDensityKgM3,
} from "./densities";
import {
  innerPlanAreaMm2,
  internalHeightMm,
  outerPlanAreaMm2,
  waterHeightMm,
} from "./geometry";
import { STANDARD_GRAVITY, kpaToPsf, litresToGallons } from "./units";
import { waterDensity } from "./water-density";

/** mm³ per litre: 1 L = 1 dm³ = 10⁶ mm³ (SI Brochure, 9th ed., Table 8: litre). */
const MM3_PER_LITRE = 1e6;
/** mm² per m² (SI prefix milli, 10⁻³ squared). */
const MM2_PER_M2 = 1e6;

export interface TankLoad {
  /** Inside the panels, bottom to rim, L. */
  grossVolumeL: number;
  grossVolumeGal: number;
  /** Water actually held at the set level, after substrate grains and rock, L. */
  netVolumeL: number;
  netVolumeGal: number;
  waterDensityKgM3: number;
  /** Mass of the net volume of water (includes the water between substrate grains), kg. */
  waterMassKg: number;
  /** Mass of the bottom and wall panels in the design's material (glass or acrylic), kg. */
  glassMassKg: number;
  /** Dry mass of the substrate bed, kg. */
  substrateMassKg: number;
  /** Bulk (bed) volume of the substrate, L. */
  substrateVolumeL: number;
  rockMassKg: number;
  /** Water displaced by the rock, L. */
  rockVolumeL: number;
  sumpWaterMassKg: number;
  standMassKg: number;
  /**
   * Everything on the floor once filled: water, panels, substrate, rock, sump water and stand, kg.
   * The sump's own glass, pumps, lights and cabinet contents aren't modelled: include them in the stand mass.
   */
  totalInstalledMassKg: number;
  /** Area the total weight is spread over, m²: the solid base, or the legs' overall outline. */
  footprintAreaM2: number;
  floorPressureKPa: number;
  floorPressurePsf: number;
  /** Share of the total on each leg, kg; null for a solid base. */
  loadPerLegKg: number | null;
  loadPerLegKN: number | null;
  /** Bearing pressure under each leg's contact patch, kPa; null for a solid base. */
  legContactPressureKPa: number | null;
}

/**
 * Computes volumes, masses and floor loads for a design. Call validateDesign
 * first: this function assumes sane inputs and only clamps volumes at zero.
 *
 * Sources: volume = plan area × height (prism volume); mass = density × volume;
 * weight = mass × standard gravity 9.80665 m/s² (3rd CGPM, 1901);
 * pressure = force / area.
 */
export function computeLoad(design: TankDesign): TankLoad {
  const innerAreaMm2 = innerPlanAreaMm2(design);
  const grossVolumeL = (innerAreaMm2 * internalHeightMm(design)) / MM3_PER_LITRE;

  const substrate = SUBSTRATE_PROPERTIES[design.substrate.type];
  const substrateDepthMm = design.substrate.type === "none" ? 0 : design.substrate.depthMm;
  const substrateVolumeL = (innerAreaMm2 * substrateDepthMm) / MM3_PER_LITRE;
  // Only the grains displace water; the pores between them fill (porosity is the pore fraction).
  const substrateSolidL = substrateVolumeL * (1 - substrate.porosity);
  // kg/m³ → kg/L: divide by 1000 (1 m³ = 1000 L).
  const substrateMassKg = (substrateVolumeL * substrate.bulkDensityKgM3) / 1000;

  const rockVolumeL = (design.rockMassKg / ROCK_DENSITY_KG_M3) * 1000;

  const waterSpaceL = (innerAreaMm2 * waterHeightMm(design)) / MM3_PER_LITRE;
  const netVolumeL = Math.max(0, waterSpaceL - substrateSolidL - rockVolumeL);

  const waterDensityKgM3 = waterDensity(design.water, design.temperatureC, design.salinityPsu);
  const waterMassKg = (netVolumeL * waterDensityKgM3) / 1000;
  const sumpWaterMassKg = (design.sumpVolumeL * waterDensityKgM3) / 1000;

  // Panels = outer solid minus the open cavity: walls plus a bottom spanning the full outline.
  const outerSolidMm3 = outerPlanAreaMm2(design) * design.heightMm;
  const cavityMm3 = innerAreaMm2 * internalHeightMm(design);
  const panelVolumeM3 = Math.max(0, outerSolidMm3 - cavityMm3) / 1e9;
  const glassMassKg = panelVolumeM3 * panelDensityKgM3(design.panelMaterial);

  const standMassKg = design.stand.massKg;
  const totalInstalledMassKg =
    waterMassKg + glassMassKg + substrateMassKg + design.rockMassKg + sumpWaterMassKg + standMassKg;
  const totalWeightKN = (totalInstalledMassKg * STANDARD_GRAVITY) / 1000;

  const fp = design.stand.footprint;
  const footprintAreaM2 =
    fp.kind === "solid"
      ? (fp.lengthMm * fp.widthMm) / MM2_PER_M2
      : (design.stand.lengthMm * design.stand.widthMm) / MM2_PER_M2;
  const floorPressureKPa = totalWeightKN / footprintAreaM2;

  let loadPerLegKg: number | null = null;
  let loadPerLegKN: number | null = null;
  let legContactPressureKPa: number | null = null;
  if (fp.kind === "legs") {
    // Equal shares assume a level floor and a stiff stand; a rocking stand can put
    // far more on one leg, which is one reason the result is only a screening figure.
    loadPerLegKg = totalInstalledMassKg / fp.count;
    loadPerLegKN = totalWeightKN / fp.count;
    legContactPressureKPa = loadPerLegKN / ((fp.legLengthMm * fp.legWidthMm) / MM2_PER_M2);
  }

  return {
    grossVolumeL,
    grossVolumeGal: litresToGallons(grossVolumeL),
    netVolumeL,
    netVolumeGal: litresToGallons(netVolumeL),
    waterDensityKgM3,
    waterMassKg,
    glassMassKg,
    substrateMassKg,
    substrateVolumeL,
    rockMassKg: design.rockMassKg,
    rockVolumeL,
    sumpWaterMassKg,
    standMassKg,
    totalInstalledMassKg,
    footprintAreaM2,
    floorPressureKPa,
    floorPressurePsf: kpaToPsf(floorPressureKPa),
    loadPerLegKg,
    loadPerLegKN,
    legContactPressureKPa,
  };
}
