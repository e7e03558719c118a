import { NextResponse } from "next/server";
import { userRoute } from "@/server/route";
import { createSpecies, listSpecies } from "@/db/queries/species";
import { speciesSchema } from "./species.schema";
import { speciesValues } from "./species-values";

/** The company's species catalogue; the lead and crew read it. */
export const GET = userRoute({ roles: ["lead", "crew"] }, async () => NextResponse.json({ species: await listSpecies() }));

/** A new species; the lead only. */
export const POST = userRoute({ roles: ["lead"], schema: speciesSchema }, async ({ input, user }) => {
  const row = await createSpecies(speciesValues(input), user.id);
  return NextResponse.json({ species: row }, { status: 201 });
});
