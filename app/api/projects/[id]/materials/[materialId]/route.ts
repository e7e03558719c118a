import { NextResponse } from "next/server";
import { parseId, parseJson, route } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { setMaterialLoaded } from "@/db/queries/materials";
import { loadedSchema } from "../material.schema";

/** Ticks a material as loaded into the van, with who and when. */
export const PATCH = route<{ id: string; materialId: string }>(async (req, { params }) => {
  const input = await parseJson(req, loadedSchema);
  const p = await params;
  const user = await requireUser();
  const { project } = await requireProject({ projectId: p.id, user, action: "tick_checklist" });
  const material = await setMaterialLoaded(project.id, parseId(p.materialId, "That material"), input.loaded, user.id);
  return NextResponse.json({ material });
});
