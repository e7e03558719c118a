import { NextResponse } from "next/server";
import { userRoute } from "@/server/route";
import { getUnitSystem, setUnitSystem } from "@/db/queries/survey-design";
import { unitSystemSchema } from "./units.schema";

export const GET = userRoute({}, async ({ user }) => NextResponse.json({ unitSystem: await getUnitSystem(user.id) }));

/** The signed-in person's choice of units for what they read and type; storage stays SI. */
export const PATCH = userRoute({ schema: unitSystemSchema }, async ({ input, user }) => {
  await setUnitSystem(user.id, input.unitSystem);
  return NextResponse.json({ unitSystem: input.unitSystem });
});
