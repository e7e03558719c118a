import { NextResponse } from "next/server";
import { userRoute } from "@/server/route";
import { getServiceSettings, setEquipmentIntervals } from "@/db/queries/service-settings";
import { companyIntervalOverrides, effectiveKindIntervals } from "@/lib/service/equipment-due";
import { DEFAULT_SERVICE_INTERVAL_DAYS } from "@/lib/service/equipment-kinds";
import { equipmentIntervalsSchema } from "./equipment-intervals.schema";

export const GET = userRoute({ roles: ["lead"] }, async () => {
  const { equipmentIntervals } = await getServiceSettings();
  return NextResponse.json({ intervals: effectiveKindIntervals(equipmentIntervals), commonPractice: DEFAULT_SERVICE_INTERVAL_DAYS });
});

/** The company's days between services per kind; a piece's own interval still wins. */
export const PUT = userRoute({ roles: ["lead"], schema: equipmentIntervalsSchema }, async ({ input }) => {
  const overrides = companyIntervalOverrides(input);
  await setEquipmentIntervals(overrides);
  return NextResponse.json({ intervals: effectiveKindIntervals(overrides) });
});
