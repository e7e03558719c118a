import { NextResponse } from "next/server";
import { route, parseJson } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { chooseProjectKit, getProjectKits } from "@/db/queries/test-kits";
import { kitChoiceSchema } from "@/app/(app)/projects/[id]/water/kit-choice.schema";

type Params = { id: string };

/** The kit each analyte is read with on this project. */
export const GET = route<Params>(async (_req, ctx) => {
  const { id } = await ctx.params;
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "log_water_test" });
  return NextResponse.json({ kits: await getProjectKits(project.id) });
});

/** Chooses the kit for one analyte (the lead, as a project detail). */
export const PUT = route<Params>(async (req, ctx) => {
  const { id } = await ctx.params;
  const input = await parseJson(req, kitChoiceSchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "edit_details" });
  return NextResponse.json({ kits: await chooseProjectKit(project.id, input.analyte, input.kitId, user.id) });
});
