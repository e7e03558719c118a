import { NextResponse } from "next/server";
import { parseId, projectRoute } from "@/server/route";
import { setMaterialLoaded } from "@/db/queries/materials";
import { loadedSchema } from "../material.schema";

/** Ticks a material as loaded into the van, with who and when. */
export const PATCH = projectRoute<typeof loadedSchema, undefined, { id: string; materialId: string }>(
  { action: "tick_checklist", schema: loadedSchema },
  async ({ input, project, user, params }) => {
    const material = await setMaterialLoaded(project.id, parseId(params.materialId, "That material"), input.loaded, user.id);
    return NextResponse.json({ material });
  },
);
