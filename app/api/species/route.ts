import { NextResponse } from "next/server";
import { parseJson, route } from "@/server/route";
import { requireUser } from "@/server/session";
import { createSpecies, listSpecies } from "@/db/queries/species";
import { speciesSchema } from "@/app/(app)/species/species.schema";
import { speciesValues } from "./species-values";

/** The company's species catalogue; the lead and crew read it. */
export const GET = route(async () => {
  await requireUser("lead", "crew");
  return NextResponse.json({ species: await listSpecies() });
});

/** A new species; the lead only. */
export const POST = route(async (req) => {
  const input = await parseJson(req, speciesSchema);
  const user = await requireUser("lead");
  const row = await createSpecies(speciesValues(input), user.id);
  return NextResponse.json({ species: row }, { status: 201 });
});
