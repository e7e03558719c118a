import { NextResponse } from "next/server";
import { route, parseJson, parseId } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { voidDose } from "@/db/queries/water";
import { voidSchema } from "@/app/(app)/projects/[id]/water/water-test.schema";

/** The lead marks a dose as logged in error (the same lead-only permission as voiding a reading). */
export const POST = route<{ id: string; doseId: string }>(async (req, ctx) => {
  const { id, doseId } = await ctx.params;
  const input = await parseJson(req, voidSchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "void_water_test" });
  const dose = await voidDose(project.id, parseId(doseId, "That dose"), user.id, input.reason);
  return NextResponse.json({ dose });
});
