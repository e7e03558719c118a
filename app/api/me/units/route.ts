import { NextResponse } from "next/server";
import { route, parseJson } from "@/server/route";
import { requireUser } from "@/server/session";
import { getUnitSystem, setUnitSystem } from "@/db/queries/survey-design";
import { unitSystemSchema } from "./units.schema";

export const GET = route(async () => {
  const user = await requireUser();
  return NextResponse.json({ unitSystem: await getUnitSystem(user.id) });
});

/** The signed-in person's choice of units for what they read and type; storage stays SI. */
export const PATCH = route(async (req) => {
  const input = await parseJson(req, unitSystemSchema);
  const user = await requireUser();
  await setUnitSystem(user.id, input.unitSystem);
  return NextResponse.json({ unitSystem: input.unitSystem });
});
