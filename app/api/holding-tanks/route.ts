import { NextResponse } from "next/server";
import { userRoute } from "@/server/route";
import { createHoldingTank, listHoldingTanks } from "@/db/queries/holding-tanks";
import { holdingTankSchema } from "./holding-tank.schema";

/** The company's holding tanks; the lead and crew read them. */
export const GET = userRoute({ roles: ["lead", "crew"] }, async () => NextResponse.json({ holdingTanks: await listHoldingTanks() }));

/** A new holding tank; the lead only. */
export const POST = userRoute({ roles: ["lead"], schema: holdingTankSchema }, async ({ input }) =>
  NextResponse.json({ holdingTank: await createHoldingTank(input) }, { status: 201 }),
);
