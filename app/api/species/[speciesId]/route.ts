import { NextResponse } from "next/server";
import { parseId, parseJson, route } from "@/server/route";
import { requireUser } from "@/server/session";
import { updateSpecies } from "@/db/queries/species";
import { speciesSchema } from "@/app/(app)/species/species.schema";
import { speciesValues } from "../species-values";

/** Changes a catalogue entry; the lead only. */
export const PUT = route<{ speciesId: string }>(async (req, { params }) => {
  const { speciesId } = await params;
  const input = await parseJson(req, speciesSchema);
  const user = await requireUser("lead");
  const row = await updateSpecies(parseId(speciesId, "That species"), speciesValues(input), user.id);
  return NextResponse.json({ species: row });
});
