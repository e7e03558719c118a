import { NextResponse } from "next/server";
import { parseId, userRoute } from "@/server/route";
import { updateSpecies } from "@/db/queries/species";
import { speciesSchema } from "../species.schema";
import { speciesValues } from "../species-values";

/** Changes a catalogue entry; the lead only. */
export const PUT = userRoute<typeof speciesSchema, undefined, { speciesId: string }>({ roles: ["lead"], schema: speciesSchema }, async ({ input, user, params }) => {
  const row = await updateSpecies(parseId(params.speciesId, "That species"), speciesValues(input), user.id);
  return NextResponse.json({ species: row });
});
