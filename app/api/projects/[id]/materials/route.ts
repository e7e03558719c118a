import { NextResponse } from "next/server";
import { projectRoute } from "@/server/route";
import { addMaterial, listMaterials } from "@/db/queries/materials";
import { newMaterialSchema } from "./material.schema";

export const GET = projectRoute({ action: "view_internal" }, async ({ project }) => NextResponse.json({ materials: await listMaterials(project.id) }));

export const POST = projectRoute({ action: "tick_checklist", schema: newMaterialSchema }, async ({ input, project }) => {
  const material = await addMaterial(project.id, input);
  return NextResponse.json({ material }, { status: 201 });
});
