import { loadApprovals, siteSurveys, tankDesigns } from "../schema";
import type { FeatureSeed } from "./demo-features";
import { loadCheck, type StoredDesign } from "../../lib/survey/load-check";
import type { SiteSurvey } from "../../lib/survey/site-survey.schema";
import { isSurveyComplete } from "../../lib/survey/survey-missing";
import { validateDesign } from "../../lib/tank/design";
import { floorBasis } from "../../lib/survey/floor-basis";
import { DEFAULT_FLOOR_CODE } from "../../lib/tank/floor-codes";

const DAY = 24 * 3600 * 1000;

type Common = Omit<StoredDesign, "shape" | "lengthMm" | "widthMm" | "heightMm" | "diameterMm" | "bowDepthMm" | "stand"> & { stand: StoredDesign["stand"] };

function common(opts: { t: number; water?: "fresh" | "salt"; substrate?: Common["substrate"]; rock: number; sump: number; stand: Common["stand"] }): Common {
  return {
    panelMaterial: opts.t >= 15 ? "low-iron glass" : "glass",
    // The demo's tanks have top frames; long open-top tanks would need a centre brace.
    topEdge: "braced",
    panelThicknessMm: opts.t,
    waterBelowRimMm: 40,
    water: opts.water ?? "fresh",
    temperatureC: 25,
    substrate: opts.substrate ?? { type: "sand", depthMm: 50 },
    rockMassKg: opts.rock,
    sumpVolumeL: opts.sump,
    stand: opts.stand,
  };
}

const solid = (l: number, w: number, massKg: number, heightMm = 850) => ({ massKg, lengthMm: l, widthMm: w, heightMm, footprint: { kind: "solid" as const, lengthMm: l, widthMm: w } });
const legs = (l: number, w: number, massKg: number, count: number) => ({ massKg, lengthMm: l, widthMm: w, heightMm: 850, footprint: { kind: "legs" as const, count, legLengthMm: 100, legWidthMm: 100 } });
const rect = (l: number, w: number, h: number, c: Common): StoredDesign => ({ shape: "rectangular", lengthMm: l, widthMm: w, heightMm: h, ...c });

/** Designs that match the tank summaries in demo-projects.ts. */
export const DEMO_DESIGNS: Record<string, StoredDesign> = {
  "quist-study": rect(900, 450, 450, common({ t: 8, substrate: { type: "aqua soil", depthMm: 60 }, rock: 12, sump: 0, stand: solid(900, 450, 40, 750) })),
  "aldous-hall": rect(1500, 600, 600, common({ t: 15, rock: 70, sump: 0, stand: solid(1500, 600, 85) })),
  "marchetti-kitchen": rect(1200, 600, 500, common({ t: 12, substrate: { type: "aqua soil", depthMm: 70 }, rock: 25, sump: 0, stand: solid(1200, 600, 70, 900) })),
  "brandt-bedroom": rect(600, 350, 350, common({ t: 6, substrate: { type: "aqua soil", depthMm: 40 }, rock: 4, sump: 0, stand: solid(1200, 600, 35, 700) })),
  "ashdown-reception": {
    shape: "cylinder",
    diameterMm: 900,
    heightMm: 1200,
    ...common({ t: 25, substrate: { type: "gravel", depthMm: 50 }, rock: 30, sump: 0, stand: solid(1000, 1000, 110, 400) }),
    panelMaterial: "acrylic",
  },
  "brandt-garden-room": rect(1200, 500, 800, common({ t: 19, substrate: { type: "aqua soil", depthMm: 80 }, rock: 45, sump: 0, stand: solid(1200, 500, 75, 700) })),
  "quist-living": { shape: "bowfront", lengthMm: 1500, widthMm: 450, bowDepthMm: 100, heightMm: 600, ...common({ t: 15, rock: 35, sump: 80, stand: solid(1500, 600, 95) }) },
  "aldous-office": rect(1200, 600, 600, common({ t: 15, water: "salt", rock: 55, sump: 120, stand: legs(1200, 600, 90, 6) })),
  "marchetti-dining": rect(2000, 450, 600, common({ t: 15, substrate: { type: "gravel", depthMm: 60 }, rock: 40, sump: 100, stand: solid(2000, 450, 110) })),
  "ashdown-surgery": rect(1800, 500, 600, common({ t: 15, rock: 30, sump: 90, stand: solid(1800, 500, 100) })),
};

const slab = (o: Partial<SiteSurvey> = {}): SiteSurvey => ({
  roomUse: "living",
  floorType: "concrete slab",
  floorLevel: "ground",
  roomLengthMm: 5400,
  roomWidthMm: 4200,
  ceilingHeightMm: 2450,
  doorWidthMm: 830,
  doorHeightMm: 2040,
  stairs: false,
  turns: 1,
  outletsWithinReach: 2,
  groundFaultProtection: "yes",
  dedicatedCircuit: "no",
  waterSupplyDistanceMm: 7000,
  drainDistanceMm: 9000,
  sunExposure: "some",
  heatSources: "Radiator on the far wall",
  ...o,
});

const joists = (o: Partial<SiteSurvey> = {}): SiteSurvey =>
  slab({ floorType: "timber joists", floorLevel: "upper", joistDirection: "perpendicular", joistSpanMm: 3900, joistSpacingMm: 400, joistSize: "47 × 220 mm", bearingWallDistanceMm: 150, stairs: true, ...o });

export const DEMO_SURVEYS: Record<string, SiteSurvey> = {
  "quist-study": joists({ roomUse: "living", roomLengthMm: 3600, roomWidthMm: 3000, notes: "Study above the garage; joists checked from the loft hatch." }),
  "aldous-hall": slab({ roomLengthMm: 6200, roomWidthMm: 1800, sunExposure: "none", notes: "Hallway; tank against the stair wall." }),
  "marchetti-kitchen": slab({ roomLengthMm: 6800, roomWidthMm: 4500, dedicatedCircuit: "yes", notes: "Peninsula end; plumbing under the sink run." }),
  "brandt-bedroom": joists({ roomUse: "sleeping", roomLengthMm: 3800, roomWidthMm: 3200, sunExposure: "strong", notes: "Shelf unit against the party wall." }),
  "ashdown-reception": slab({ roomUse: "living", roomLengthMm: 7500, roomWidthMm: 5200, doorWidthMm: 1100, doorHeightMm: 2100, dedicatedCircuit: "yes", notes: "Reception; double doors to the street." }),
  "brandt-garden-room": slab({ roomLengthMm: 4200, roomWidthMm: 3600, sunExposure: "strong", notes: "Garden room: blinds needed on the south side." }),
  "quist-living": joists({ floorLevel: "ground", roomLengthMm: 5600, roomWidthMm: 4300, stairs: false, notes: "Suspended ground floor; crawl space under." }),
  "aldous-office": joists({ roomLengthMm: 4000, roomWidthMm: 3400, bearingWallDistanceMm: 0, dedicatedCircuit: "yes" }),
  "marchetti-dining": slab({ roomLengthMm: 5800, roomWidthMm: 4600 }),
  "ashdown-surgery": slab({ roomLengthMm: 9000, roomWidthMm: 1900, doorWidthMm: 900, notes: "Corridor; tank set into the wall recess." }),
};

/** The one survey still being filled in, for a project in site survey. */
const DRAFT_KEY = "brandt-lounge";
const DRAFT: Partial<SiteSurvey> = { roomUse: "living", floorType: "timber joists", floorLevel: "ground", roomLengthMm: 6100, roomWidthMm: 4700, doorWidthMm: 790, notes: "Joist direction to check from the cellar next visit." };

/** Projects past the stand & load check have a standing approval. */
const APPROVED = ["marchetti-kitchen", "brandt-bedroom", "ashdown-reception", "brandt-garden-room", "quist-living", "aldous-office", "marchetti-dining", "ashdown-surgery"];

/** Invented structural engineers for the designs that screen over the floor's rated load. */
const ENGINEERS = ["Harrow & Vell Structures", "Pellam Lowe Consulting", "Quarrybank Engineering"];

export const seedDemoSurvey: FeatureSeed = async (tx, { now, projectIds, peopleIds }) => {
  const lead = peopleIds.lead;
  await tx.insert(siteSurveys).values({ projectId: projectIds[DRAFT_KEY], data: DRAFT as Record<string, unknown>, complete: isSurveyComplete(DRAFT), updatedBy: peopleIds.crew1, updatedAt: new Date(now.getTime() - 2 * DAY) });
  let n = 0;
  for (const [key, design] of Object.entries(DEMO_DESIGNS)) {
    const projectId = projectIds[key];
    if (!projectId) continue;
    const problems = validateDesign(design);
    if (problems.length) throw new Error(`Demo design ${key}: ${problems.map((p) => p.message).join(" ")}`);
    const survey = DEMO_SURVEYS[key];
    const at = new Date(now.getTime() - (20 + n) * DAY);
    await tx.insert(siteSurveys).values({ projectId, data: survey as Record<string, unknown>, complete: isSurveyComplete(survey), updatedBy: lead, updatedAt: at });
    await tx.insert(tankDesigns).values({ projectId, data: design as unknown as Record<string, unknown>, updatedBy: lead, updatedAt: new Date(at.getTime() + DAY) });
    if (!APPROVED.includes(key)) continue;
    const results = loadCheck(design, survey);
    if (!results.glass.ok) throw new Error(`Demo design ${key} has a panel too thin for its water.`);
    const engineer = ENGINEERS[n % ENGINEERS.length];
    const approvedAt = new Date(at.getTime() + 2 * DAY);
    await tx.insert(loadApprovals).values({
      projectId,
      designSnapshot: design as unknown as Record<string, unknown>,
      resultSnapshot: JSON.parse(JSON.stringify(results)) as Record<string, unknown>,
      engineerReference: results.needsEngineerReference ? `${engineer}, floor check of ${approvedAt.toISOString().slice(0, 10)}, ref ${engineer.slice(0, 2).toUpperCase()}-${4100 + n}` : null,
      approvedBy: lead,
      approvedAt,
      floorBasis: floorBasis(survey, DEFAULT_FLOOR_CODE),
      rulesVersion: 2,
    });
    n++;
  }
};
