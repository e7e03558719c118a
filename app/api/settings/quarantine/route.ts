import { NextResponse } from "next/server";
import { parseJson, route } from "@/server/route";
import { requireUser } from "@/server/session";
import { getQuarantineDays, setQuarantineDays } from "@/db/queries/holding-tanks";
import { quarantineSettingSchema } from "@/app/(app)/settings/quarantine.schema";
import { DEFAULT_QUARANTINE_DAYS } from "@/lib/stocking/quarantine";

export const GET = route(async () => {
  await requireUser("lead");
  return NextResponse.json({ quarantineDays: await getQuarantineDays(), defaultDays: DEFAULT_QUARANTINE_DAYS });
});

/** The company's quarantine period; batches already in quarantine keep the period they started with. */
export const PUT = route(async (req) => {
  const input = await parseJson(req, quarantineSettingSchema);
  await requireUser("lead");
  await setQuarantineDays(input.quarantineDays);
  return NextResponse.json({ quarantineDays: input.quarantineDays });
});
