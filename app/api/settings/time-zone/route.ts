import { NextResponse } from "next/server";
import { userRoute } from "@/server/route";
import { getServiceSettings, setCompanyTimeZone } from "@/db/queries/service-settings";
import { timeZoneSchema } from "./time-zone.schema";

export const GET = userRoute({ roles: ["lead"] }, async () => NextResponse.json({ timeZone: (await getServiceSettings()).timeZone }));

/** The zone service visits recur in and due dates are counted in. */
export const PUT = userRoute({ roles: ["lead"], schema: timeZoneSchema }, async ({ input }) => {
  await setCompanyTimeZone(input.timeZone);
  return NextResponse.json({ timeZone: input.timeZone });
});
