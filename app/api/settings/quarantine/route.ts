import { NextResponse } from "next/server";
import { userRoute } from "@/server/route";
import { getQuarantineDays, setQuarantineDays } from "@/db/queries/holding-tanks";
import { quarantineSettingSchema } from "./quarantine.schema";
import { DEFAULT_QUARANTINE_DAYS } from "@/lib/stocking/quarantine";

export const GET = userRoute({ roles: ["lead"] }, async () => NextResponse.json({ quarantineDays: await getQuarantineDays(), defaultDays: DEFAULT_QUARANTINE_DAYS }));

/** The company's quarantine period; batches already in quarantine keep the period they started with. */
export const PUT = userRoute({ roles: ["lead"], schema: quarantineSettingSchema }, async ({ input }) => {
  await setQuarantineDays(input.quarantineDays);
  return NextResponse.json({ quarantineDays: input.quarantineDays });
});
