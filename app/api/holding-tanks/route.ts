import { NextResponse } from "next/server";
import { parseJson, route } from "@/server/route";
import { requireUser } from "@/server/session";
import { createHoldingTank, listHoldingTanks } from "@/db/queries/holding-tanks";
import { holdingTankSchema } from "@/app/(app)/holding-tanks/holding-tank.schema";

/** The company's holding tanks; the lead and crew read them. */
export const GET = route(async () => {
  await requireUser("lead", "crew");
  return NextResponse.json({ holdingTanks: await listHoldingTanks() });
});

/** A new holding tank; the lead only. */
export const POST = route(async (req) => {
  const input = await parseJson(req, holdingTankSchema);
  await requireUser("lead");
  return NextResponse.json({ holdingTank: await createHoldingTank(input) }, { status: 201 });
});
