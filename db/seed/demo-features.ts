import type { Tx } from "../index";
import { seedDemoInstall } from "./demo-install";
import { seedDemoPortal } from "./demo-portal";
import { seedDemoSurvey } from "./demo-survey";
import { seedDemoWater } from "./demo-water";
import { seedDemoKits } from "./demo-kits";
import { seedDemoMoney } from "./demo-money";
import { seedDemoLivestock } from "./demo-livestock";
import { seedDemoEquipment } from "./demo-equipment";
import { seedDemoService } from "./demo-service";
import { seedDemoServiceWater } from "./demo-service-water";

/** What a feature's demo seed gets: today, and the ids of the demo projects and people by key. */
export type DemoContext = { now: Date; projectIds: Record<string, string>; peopleIds: Record<string, string> };

export type FeatureSeed = (tx: Tx, ctx: DemoContext) => Promise<void>;

/** Each feature adds its demo records here, in order, inside the seed's one transaction. */
export const DEMO_FEATURE_SEEDS: FeatureSeed[] = [
  seedDemoInstall,
  seedDemoPortal,
  seedDemoWater,
  seedDemoSurvey,
  seedDemoKits,
  seedDemoMoney,
  seedDemoLivestock,
  seedDemoEquipment,
  seedDemoService,
  seedDemoServiceWater,
];
