import { z } from "zod";
import { validateDesign, type TankDesign } from "../tank/design";

/**
 * The tank design as stored in `tank_designs.data` (lib/tank's TankDesign, SI). Zod checks the
 * shape and types; validateDesign then checks the values and how they relate, and its problems
 * become field messages at the same paths, so the form and the server answer alike.
 */

export const TANK_SHAPES = ["rectangular", "cylinder", "bowfront"] as const;
export const PANEL_MATERIALS = ["glass", "low-iron glass", "acrylic"] as const;
export const WATER_KINDS = ["fresh", "salt"] as const;
export const SUBSTRATE_TYPES = ["sand", "gravel", "aqua soil", "none"] as const;

const num = (label: string) => z.number({ error: `Enter the ${label}.` }).refine(Number.isFinite, `The ${label} must be a number.`);
/** Upper bounds past which a figure is a slip of the keyboard; our own cut-offs. */
const upTo = (label: string, max: number, unit: string) => num(label).refine((v) => v <= max, `The ${label} is over ${max} ${unit}: check the units.`);

const footprint = z.discriminatedUnion(
  "kind",
  [
    z.object({ kind: z.literal("solid"), lengthMm: num("stand base length"), widthMm: num("stand base width") }),
    z.object({
      kind: z.literal("legs"),
      count: upTo("number of legs", 64, "legs"),
      legLengthMm: num("leg length"),
      legWidthMm: num("leg width"),
    }),
  ],
  { error: "Choose a solid base or legs." },
);

export const TOP_EDGES = ["free", "braced"] as const;

const common = {
  panelMaterial: z.enum(PANEL_MATERIALS, { error: "Choose the panel material." }),
  topEdge: z.enum(TOP_EDGES, { error: "Say how the top edge is held: open top, or a top frame or brace." }).default("free"),
  panelThicknessMm: num("panel thickness"),
  bottomThicknessMm: num("bottom thickness").optional(),
  waterBelowRimMm: num("water level below the rim"),
  water: z.enum(WATER_KINDS, { error: "Choose fresh or salt water." }),
  salinityPsu: num("salinity").optional(),
  temperatureC: num("water temperature"),
  substrate: z.object({
    type: z.enum(SUBSTRATE_TYPES, { error: "Choose the substrate." }),
    depthMm: num("substrate depth"),
  }),
  rockMassKg: upTo("rock weight", 5_000, "kg"),
  sumpVolumeL: upTo("sump volume", 20_000, "L"),
  stand: z.object({
    massKg: upTo("stand weight", 5_000, "kg"),
    lengthMm: num("stand length"),
    widthMm: num("stand width"),
    /** Not part of the load: only used to check the stand gets through the door. */
    heightMm: num("stand height")
      .refine((v) => v > 0 && v <= 10_000, "The stand height must be more than zero and under 10 m.")
      .optional(),
    footprint,
  }),
};

const shapes = z.discriminatedUnion(
  "shape",
  [
    z.object({ shape: z.literal("rectangular"), lengthMm: num("length"), widthMm: num("width"), heightMm: num("height"), ...common }),
    z.object({ shape: z.literal("cylinder"), diameterMm: num("diameter"), heightMm: num("height"), ...common }),
    z.object({
      shape: z.literal("bowfront"),
      lengthMm: num("length"),
      widthMm: num("width at the ends"),
      bowDepthMm: num("bow depth"),
      heightMm: num("height"),
      ...common,
    }),
  ],
  { error: "Choose the tank's shape." },
);

export const tankDesignSchema = shapes.superRefine((design, ctx) => {
  for (const problem of validateDesign(design as TankDesign)) {
    ctx.addIssue({ code: "custom", path: problem.field.split("."), message: problem.message });
  }
});

export type TankDesignInput = z.infer<typeof tankDesignSchema>;
