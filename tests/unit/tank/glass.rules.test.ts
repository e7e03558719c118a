// The glass rules pinned sentence by sentence and at their edges: where a plate table ends, which
// case names a tie, when an entered thickness is "enough", and what each panel of a design reports.
// Figures use σ_allow = 19.3 MPa / 3.8 (modulus of rupture from memory, safety factor common
// practice), g = 9.80665 m/s² (3rd CGPM) and Roark 7th ed. Table 11.4 β (from memory).
import { describe, expect, it } from "vitest";
import { BRACED_WIDE_TABLE, checkGlass, interpolateTable, minimumPanelThickness, plateCoefficient } from "@/lib/tank/glass";
import { minimumCylinderWallThickness } from "@/lib/tank/glass-cylinder";
import { panelThicknessMessage } from "@/lib/tank/glass-strength";
import type { TankDesign } from "@/lib/tank/design";
import { demoDesign } from "./fixtures";

const SIGMA = 19.3e6 / 3.8; // Pa
const G = 9.80665;
const ACRYLIC_NOTE =
  "Acrylic bows out under load far more than glass, and its thickness is often set by how far it bows, which this check doesn't cover: get the panel maker's figure.";
const PAST_STANDARD = "That is past standard float glass: laminated or specially made panels are needed.";
const BEYOND = "This panel's proportions are past the plate table, so the figure is only a lower bound.";
const CYLINDER_NOTE =
  "This is the strength figure for water pressure only; curved panels' thickness is usually set by how they are made and handled, so confirm it with the panel maker.";
const BOTTOM_NOTE = "This assumes the bottom sits flat on a level, continuous stand top; a bottom carried only at its edges needs its own design.";

describe("plate tables: the ends and the ties", () => {
  it("a ratio exactly at the table's last entry is inside it, with the last β", () => {
    expect(interpolateTable(BRACED_WIDE_TABLE, 4)).toBe(0.37);
    expect(plateCoefficient(4000, 1000, "braced")).toEqual({ beta: 0.37, beyondTable: false, bMm: 1000, ratio: 4, plateCase: "1e" });
  });

  it("a square braced panel is case 1e (b = H)", () => {
    expect(plateCoefficient(1000, 1000, "braced")).toEqual({ beta: 0.16, beyondTable: false, bMm: 1000, ratio: 1, plateCase: "1e" });
  });

  it("a tall open-top panel takes the larger β of cases 10 and 1d, naming the one that gave it", () => {
    // H/L = 1.6: case 1d interpolates to 0.26 + 0.08 × 0.1 / 0.5 = 0.276, below case 10's end value 0.28.
    expect(plateCoefficient(1000, 1600, "free")).toMatchObject({ beta: 0.28, plateCase: "10", beyondTable: true, bMm: 1000 });
    // H/L = 2: case 1d gives 0.34.
    expect(plateCoefficient(1000, 2000, "free")).toMatchObject({ beta: 0.34, plateCase: "1d", beyondTable: true });
    // H/L = 1.625: both give 0.28; the tie keeps the open-top case.
    expect(plateCoefficient(800, 1300, "free")).toEqual({ beta: 0.28, plateCase: "10", beyondTable: true, bMm: 800, ratio: 1.625 });
  });
});

describe("panelThicknessMessage: each verdict in full", () => {
  it("with nothing entered it gives the need and the next standard glass", () => {
    expect(panelThicknessMessage(4.04, null, 5, "glass")).toBe("Needs at least 4.0 mm (next standard glass: 5 mm).");
  });
  it("an entered thickness equal to the need is enough", () => {
    expect(panelThicknessMessage(4.04, 4.04, 5, "glass")).toBe("Needs at least 4.0 mm; 4.04 mm entered is enough.");
  });
  it("a thinner one is too thin, with the next standard glass", () => {
    expect(panelThicknessMessage(4.04, 4, 5, "glass")).toBe("Needs at least 4.0 mm; 4 mm entered is too thin (next standard glass: 5 mm).");
  });
  it("past 25 mm glass it says standard float glass won't do", () => {
    expect(panelThicknessMessage(30, null, null, "glass")).toBe(`Needs at least 30.0 mm. ${PAST_STANDARD}`);
  });
  it("acrylic gets the bowing note and no standard glass", () => {
    expect(panelThicknessMessage(30, 20, null, "acrylic")).toBe(`Needs at least 30.0 mm; 20 mm entered is too thin. ${ACRYLIC_NOTE}`);
  });
});

describe("minimumPanelThickness: notes, the bound and ok", () => {
  const base = { waterHeightMm: 500, panelLengthMm: 1000, topEdge: "braced" as const };

  it("ordinary glass has no material note; acrylic and very thick glass do", () => {
    expect(minimumPanelThickness({ ...base, material: "glass" }).notes).toEqual([]);
    expect(minimumPanelThickness({ ...base, material: "acrylic" }).notes).toEqual([ACRYLIC_NOTE]);
    expect(minimumPanelThickness({ ...base, waterHeightMm: 2500, panelLengthMm: 5000, material: "glass" }).notes).toEqual([PAST_STANDARD]);
  });

  it("with nothing entered, ok is null rather than false", () => {
    expect(minimumPanelThickness({ ...base, material: "glass" }).ok).toBeNull();
  });

  it("an entered thickness exactly equal to the requirement passes", () => {
    const need = minimumPanelThickness({ ...base, material: "glass" }).requiredMm;
    expect(minimumPanelThickness({ ...base, material: "glass", enteredMm: need }).ok).toBe(true);
  });

  it("past the table, meeting the lower bound is said to prove nothing, and an open top is told to brace", () => {
    // H/L = 1.625, case 10 at its end, β = 0.28: t = L·√(β·ρgH/σ)
    const need = 800 * Math.sqrt((0.28 * 1000 * G * 1.3) / SIGMA);
    const r = minimumPanelThickness({ waterHeightMm: 1300, panelLengthMm: 800, material: "glass", enteredMm: 100 });
    const advice = `${BEYOND} An open-top panel this shape needs a centre brace (or a top frame), or the panel maker's own calculation.`;
    expect(r.requiredMm).toBeCloseTo(need, 9);
    expect(r.message).toBe(`Needs at least ${need.toFixed(1)} mm; 100 mm entered meets that, but that is not enough to go on. ${advice}`);
    expect(r.notes).toEqual([advice]);
    expect(r.ok).toBe(false);
  });

  it("past the table with nothing entered, it gives the need without claiming anything meets it", () => {
    const need = 800 * Math.sqrt((0.28 * 1000 * G * 1.3) / SIGMA);
    const r = minimumPanelThickness({ waterHeightMm: 1300, panelLengthMm: 800, material: "glass" });
    expect(r.message).toBe(
      `Needs at least ${need.toFixed(1)} mm (next standard glass: 25 mm). ${BEYOND} An open-top panel this shape needs a centre brace (or a top frame), or the panel maker's own calculation.`,
    );
    expect(r.ok).toBeNull();
  });

  it("past the table with a braced top, too thin, it keeps the usual verdict and asks for a brace", () => {
    // L/H = 5, case 1e at its end, β = 0.37, b = H
    const need = 500 * Math.sqrt((0.37 * 1000 * G * 0.5) / SIGMA);
    const r = minimumPanelThickness({ waterHeightMm: 500, panelLengthMm: 2500, material: "glass", topEdge: "braced", enteredMm: 8 });
    expect(need.toFixed(1)).toBe("9.4");
    expect(r.message).toBe(
      `Needs at least ${need.toFixed(1)} mm; 8 mm entered is too thin (next standard glass: 10 mm). ${BEYOND} It needs a centre brace or the panel maker's own calculation.`,
    );
  });
});

describe("minimumCylinderWallThickness: stress, ok and advice", () => {
  // t = 6·ρgH·r / (σ·√(12(1 − ν²))), ν = 0.22 for glass (from memory); Timoshenko & Woinowsky-Krieger §117
  const k = 6 / Math.sqrt(12 * (1 - 0.22 * 0.22));
  const p = 1000 * G * 1; // H = 1 m
  const r = 0.5; // D = 1 m

  it("reports the bending stress in the entered wall", () => {
    const c = minimumCylinderWallThickness({ waterHeightMm: 1000, diameterMm: 1000, material: "glass", enteredMm: 5 });
    expect(c.stressMPa).toBeCloseTo((k * p * r) / 0.005 / 1e6, 9);
    expect(c.ok).toBe(true);
    expect(c.message).toBe(`Needs at least ${((k * p * r) / SIGMA * 1000).toFixed(1)} mm; 5 mm entered is enough. ${CYLINDER_NOTE}`);
  });

  it("with nothing entered reports the stress at the required thickness, the allowable one, and the next standard glass", () => {
    const c = minimumCylinderWallThickness({ waterHeightMm: 1000, diameterMm: 1000, material: "glass" });
    expect(c.stressMPa).toBeCloseTo(19.3 / 3.8, 9);
    expect(c.ok).toBeNull();
    expect(c.message).toBe(`Needs at least ${((k * p * r) / SIGMA * 1000).toFixed(1)} mm (next standard glass: 3 mm). ${CYLINDER_NOTE}`);
  });

  it("an entered wall exactly as thick as needed passes; a hair thinner fails", () => {
    const need = minimumCylinderWallThickness({ waterHeightMm: 1000, diameterMm: 1000, material: "glass" }).requiredMm;
    expect(minimumCylinderWallThickness({ waterHeightMm: 1000, diameterMm: 1000, material: "glass", enteredMm: need }).ok).toBe(true);
    expect(minimumCylinderWallThickness({ waterHeightMm: 1000, diameterMm: 1000, material: "glass", enteredMm: need * 0.999 }).ok).toBe(false);
  });

  it("acrylic gets no standard glass size and the bowing note", () => {
    const c = minimumCylinderWallThickness({ waterHeightMm: 1000, diameterMm: 1000, material: "acrylic" });
    expect(c.message).toBe(`Needs at least ${c.requiredMm.toFixed(1)} mm. ${ACRYLIC_NOTE} ${CYLINDER_NOTE}`);
  });
});

describe("checkGlass: what each panel reports", () => {
  it("a round wall reports its source, its note and no lower bound; exactly thick enough passes, bottom too", () => {
    // The wall's need doesn't depend on its own thickness once the bottom's is fixed.
    const probe: TankDesign = { ...demoDesign(), shape: "cylinder", diameterMm: 1000, heightMm: 1000, panelThicknessMm: 10, bottomThicknessMm: 10 };
    const need = checkGlass(probe).panels[0].requiredMm;
    const g = checkGlass({ ...probe, panelThicknessMm: need });
    expect(g.panels[0]).toMatchObject({
      panel: "wall",
      ok: true,
      beta: null,
      lowerBound: false,
      notes: [CYLINDER_NOTE],
      source: "Thin-walled cylinder with bending at a built-in base (Timoshenko & Woinowsky-Krieger, Theory of Plates and Shells, §117)",
    });
    expect(g.panels[1]).toMatchObject({ panel: "bottom", requiredMm: need, enteredMm: 10, ok: true, lowerBound: false });
    expect(g.ok).toBe(true);
  });

  it("a bottom exactly as thick as the thickest wall needs passes", () => {
    const probe: TankDesign = { ...demoDesign(), bottomThicknessMm: 25, heightMm: 710 + 25 };
    const need = checkGlass(probe).panels[2].requiredMm;
    // Same 710 mm inside height with the bottom at exactly the need.
    const exact: TankDesign = { ...demoDesign(), bottomThicknessMm: need, heightMm: 710 + need };
    expect(exact.heightMm - need).toBe(710);
    const bottom = checkGlass(exact).panels[2];
    expect(bottom.requiredMm).toBe(need);
    expect(bottom.ok).toBe(true);
  });

  it("a bowfront's curved front, and only it, carries the flat-panel note", () => {
    const bow: TankDesign = { ...demoDesign(), shape: "bowfront", lengthMm: 1200, widthMm: 500, bowDepthMm: 150, heightMm: 600 };
    const [front, sides] = checkGlass(bow).panels;
    const flat = "The curved front is checked as a flat panel, which is on the safe side.";
    expect(front.notes.at(-1)).toBe(flat);
    expect(front.message.endsWith(` ${flat}`)).toBe(true);
    expect(sides.notes).not.toContain(flat);
    expect(sides.message).not.toContain("curved front");
  });

  it("a rectangular front carries only the plate result, word for word", () => {
    const d = demoDesign();
    const [front, sides] = checkGlass(d).panels;
    const advice = `${BEYOND} An open-top panel this shape needs a centre brace (or a top frame), or the panel maker's own calculation.`;
    expect(front.notes).toEqual([advice]);
    // β = 0.11 (case 10's first entry), b = L: t = 1.8 × √(0.11 × ρgH / σ) with ρ = 997.05 (fresh, 25 °C), H = 0.685 m
    expect(front.requiredMm).toBeCloseTo(1800 * Math.sqrt((0.11 * 997.0474 * G * 0.685) / SIGMA), 3);
    expect(front.message).toBe(`Needs at least 21.7 mm; 15 mm entered is too thin (next standard glass: 25 mm). ${advice}`);
    // The front (H/L = 685/1800 = 0.38) is short of case 10's first ratio 0.5: a lower bound; the sides (685/600) are inside.
    expect(front.lowerBound).toBe(true);
    expect(front.source).toBe("Roark's Formulas for Stress and Strain, 7th ed., Table 11.4 case 10 (three edges simply supported, top edge free), β = 0.110, past the table");
    expect(sides.lowerBound).toBe(false);
    expect(sides.source).toBe(`Roark's Formulas for Stress and Strain, 7th ed., Table 11.4 case 10 (three edges simply supported, top edge free), β = ${sides.beta?.toFixed(3)}`);
    expect(sides.source.endsWith("table")).toBe(false);
  });

  it("the bottom is a lower bound when any wall is, and says so in full", () => {
    const g = checkGlass({ ...demoDesign(), bottomThicknessMm: 25 });
    const bottom = g.panels[2];
    const need = Math.max(g.panels[0].requiredMm, g.panels[1].requiredMm);
    expect(bottom).toEqual({
      panel: "bottom",
      requiredMm: need,
      enteredMm: 25,
      ok: true,
      beta: null,
      stressMPa: null,
      lowerBound: true,
      source: "Common practice: the bottom at least as thick as the thickest wall needs, on a flat, level, continuous stand top",
      notes: [BOTTOM_NOTE],
      message: `Needs at least ${need.toFixed(1)} mm, as thick as the thickest wall needs; 25 mm entered is enough. ${BOTTOM_NOTE}`,
    });
    const thin = checkGlass(demoDesign()).panels[2];
    expect(thin.message).toBe(
      `Needs at least ${thin.requiredMm.toFixed(1)} mm, as thick as the thickest wall needs; 15 mm entered is too thin. ${BOTTOM_NOTE}`,
    );
    // A design with no wall past the table: the sides alone, braced, are inside it.
    const inside = checkGlass({ ...demoDesign(), lengthMm: 900, topEdge: "braced" }).panels;
    expect(inside.map((p) => p.lowerBound)).toEqual([false, false, false]);
  });
});
