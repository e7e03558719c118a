import { NextResponse } from "next/server";
import { parseJson, route } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { getStockingPlan, savePlanSettings } from "@/db/queries/stocking-plan";
import { planSettingsSchema } from "@/app/(app)/projects/[id]/fish/plan.schema";
import { RULE_OF_THUMB_CAUTION } from "@/lib/stocking/checks";

type Params = { id: string };

/** The plan with its checks; the lead and assigned crew. */
export const GET = route<Params>(async (_req, { params }) => {
  const { id } = await params;
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "view_stocking_plan" });
  return NextResponse.json({ ...(await getStockingPlan(project.id)), caution: RULE_OF_THUMB_CAUTION });
});

/** The plan's settings (reef, target pH); the lead only. */
export const PUT = route<Params>(async (req, { params }) => {
  const { id } = await params;
  const input = await parseJson(req, planSettingsSchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "edit_stocking_plan" });
  await savePlanSettings({ projectId: project.id, userId: user.id, ...input });
  return NextResponse.json({ ...(await getStockingPlan(project.id)), caution: RULE_OF_THUMB_CAUTION });
});
