import { NextResponse } from "next/server";
import { parseJson, route } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { addMaterial, listMaterials } from "@/db/queries/materials";
import { newMaterialSchema } from "./material.schema";

export const GET = route<{ id: string }>(async (_req, { params }) => {
  const user = await requireUser("lead", "crew");
  const { project } = await requireProject({ projectId: (await params).id, user, action: "tick_checklist" });
  return NextResponse.json({ materials: await listMaterials(project.id) });
});

export const POST = route<{ id: string }>(async (req, { params }) => {
  const input = await parseJson(req, newMaterialSchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: (await params).id, user, action: "tick_checklist" });
  const material = await addMaterial(project.id, input);
  return NextResponse.json({ material }, { status: 201 });
});
