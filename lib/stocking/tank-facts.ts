import type { TankDesign } from "../tank/design";
import type { TankFacts } from "./checks";
import { tankWaterKind } from "./species";

/** The inside length along the front (a cylinder's diameter), mm, or null when the design doesn't give it. */
export function insideLengthMm(design: TankDesign): number | null {
  const outer = design.shape === "cylinder" ? design.diameterMm : design.lengthMm;
  const wall = design.panelThicknessMm;
  if (!Number.isFinite(outer) || !Number.isFinite(wall)) return null;
  const inside = outer - 2 * wall;
  return inside > 0 ? inside : null;
}

/** What the stocking checks know about a tank, from its design, its net volume and the plan's settings. */
export function tankFacts(opts: { design: TankDesign | null; netVolumeL: number | null; reef: boolean; pH: number | null }): TankFacts {
  const d = opts.design;
  return {
    water: d && (d.water === "fresh" || d.water === "salt") ? tankWaterKind(d.water, d.salinityPsu) : null,
    lengthMm: d ? insideLengthMm(d) : null,
    netVolumeL: opts.netVolumeL,
    tempC: d && Number.isFinite(d.temperatureC) ? d.temperatureC : null,
    pH: opts.pH,
    reef: opts.reef,
  };
}
