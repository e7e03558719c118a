import type { Stage } from "../../lib/stages/stages";
import type { DemoPersonKey } from "./demo-people";

/** The demo's installs, spread over every stage. Days are relative to the day of seeding. */
export type DemoProject = {
  key: string;
  title: string;
  client: DemoPersonKey;
  crew: DemoPersonKey[];
  address: string;
  town: string;
  stage: Stage;
  /** Days ago the project entered its current stage. */
  stageDaysAgo: number;
  /** Target install date, in days from today (negative: in the past). */
  installInDays: number;
  tank: string;
};

export const DEMO_PROJECTS: DemoProject[] = [
  { key: "brandt-lounge", title: "Brandt lounge reef", client: "hollis", crew: ["crew1"], address: "14 Quarry Lane", town: "Quillhaven", stage: "site_survey", stageDaysAgo: 3, installInDays: 40, tank: "1800 × 600 × 650 mm reef" },
  { key: "ashdown-waiting", title: "Ashdown waiting-room wall tank", client: "rafe", crew: ["crew1", "crew2"], address: "2 Teasel Parade", town: "Brackenfold Cross", stage: "site_survey", stageDaysAgo: 9, installInDays: 25, tank: "2400 × 500 × 700 mm freshwater" },
  { key: "quist-study", title: "Quist study nano-planted", client: "amara", crew: ["crew2"], address: "7 Tern Court", town: "Tessling Bay", stage: "stand_load_check", stageDaysAgo: 5, installInDays: 18, tank: "900 × 450 × 450 mm planted" },
  { key: "aldous-hall", title: "Aldous hallway cichlid tank", client: "wen", crew: ["crew1"], address: "31 Sallowfen Rise", town: "Orrowfen", stage: "stand_load_check", stageDaysAgo: 12, installInDays: -2, tank: "1500 × 600 × 600 mm rift lake" },
  { key: "marchetti-kitchen", title: "Marchetti kitchen peninsula", client: "odile", crew: ["crew2"], address: "5 Heron Walk", town: "Larkwhistle", stage: "aquascape", stageDaysAgo: 2, installInDays: 0, tank: "1200 × 600 × 500 mm planted" },
  { key: "ashdown-reception", title: "Ashdown reception cylinder", client: "rafe", crew: ["crew1"], address: "2 Teasel Parade", town: "Brackenfold Cross", stage: "fill_leak_test", stageDaysAgo: 1, installInDays: -1, tank: "Ø 900 × 1200 mm cylinder" },
  { key: "brandt-garden-room", title: "Brandt garden-room paludarium", client: "hollis", crew: ["crew2"], address: "14 Quarry Lane", town: "Quillhaven", stage: "cycling", stageDaysAgo: 12, installInDays: -13, tank: "1200 × 500 × 800 mm paludarium" },
  { key: "quist-living", title: "Quist living-room bow-front", client: "amara", crew: ["crew1", "crew2"], address: "7 Tern Court", town: "Tessling Bay", stage: "cycling", stageDaysAgo: 26, installInDays: -27, tank: "1500 × 550 × 600 mm bow-front" },
  { key: "aldous-office", title: "Aldous home-office reef", client: "wen", crew: ["crew2"], address: "31 Sallowfen Rise", town: "Orrowfen", stage: "first_stocking", stageDaysAgo: 4, installInDays: -38, tank: "1200 × 600 × 600 mm reef" },
  { key: "marchetti-dining", title: "Marchetti dining-room divider", client: "odile", crew: ["crew1"], address: "5 Heron Walk", town: "Larkwhistle", stage: "in_service", stageDaysAgo: 60, installInDays: -110, tank: "2000 × 450 × 600 mm community" },
  { key: "ashdown-surgery", title: "Ashdown surgery corridor", client: "rafe", crew: ["crew2"], address: "2 Teasel Parade", town: "Brackenfold Cross", stage: "in_service", stageDaysAgo: 150, installInDays: -200, tank: "1800 × 500 × 600 mm community" },
  { key: "brandt-bedroom", title: "Brandt bedroom shrimp shelf", client: "hollis", crew: ["crew1"], address: "14 Quarry Lane", town: "Quillhaven", stage: "aquascape", stageDaysAgo: 6, installInDays: 3, tank: "600 × 350 × 350 mm shrimp" },
];
