/** Small install-day figures built on lib/tank: the bed area from a stored design, and a fill summary. */
import type { TankDesign } from "../tank/design";

export type BedFootprint = { lengthMm: number; widthMm: number; note: string | null };

const num = (v: unknown): number | null => (typeof v === "number" && Number.isFinite(v) && v > 0 ? v : null);

/**
 * The substrate bed's length and width from a saved design (outer dimensions less two side panels).
 * A cylinder's round floor is given as the square of equal area (side = D·√π / 2) so the
 * prism volume in substrateQuantity stays exact.
 */
export function bedFootprintFromDesign(data: Record<string, unknown> | null | undefined): BedFootprint | null {
  if (!data) return null;
  const panel = num(data.panelThicknessMm) ?? 0;
  if (data.shape === "cylinder") {
    const d = num(data.diameterMm);
    if (!d) return null;
    const inner = d - 2 * panel;
    const side = (inner * Math.sqrt(Math.PI)) / 2;
    return { lengthMm: side, widthMm: side, note: "Round floor: shown as the square of the same area." };
  }
  const l = num(data.lengthMm);
  const w = num(data.widthMm);
  if (!l || !w) return null;
  const bow = data.shape === "bowfront" ? (num(data.bowDepthMm) ?? 0) : 0;
  return {
    lengthMm: l - 2 * panel,
    widthMm: w - 2 * panel + bow / 2,
    note: bow ? "Bow front: depth includes half the bow, a close estimate." : null,
  };
}

/** True when the stored JSON has the fields computeLoad needs; the design editor validates the rest. */
export function looksLikeDesign(data: Record<string, unknown> | null | undefined): data is Record<string, unknown> & TankDesign {
  if (!data || typeof data !== "object") return false;
  const d = data as Record<string, unknown>;
  return typeof d.shape === "string" && typeof d.heightMm === "number" && typeof d.substrate === "object" && typeof d.stand === "object";
}
