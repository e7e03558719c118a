import { NextResponse } from "next/server";
import { projectRoute } from "@/server/route";
import { getStockingPlan, savePlanSettings } from "@/db/queries/stocking-plan";
import { planSettingsSchema } from "./plan.schema";
import { RULE_OF_THUMB_CAUTION } from "@/lib/stocking/checks";

/** The plan with its checks; the lead and assigned crew. */
export const GET = projectRoute({ action: "view_stocking_plan" }, async ({ project }) =>
  NextResponse.json({ ...(await getStockingPlan(project.id)), caution: RULE_OF_THUMB_CAUTION }),
);

/** The plan's settings (reef, target pH); the lead only. */
export const PUT = projectRoute({ action: "edit_stocking_plan", schema: planSettingsSchema }, async ({ input, project, user }) => {
  await savePlanSettings({ projectId: project.id, userId: user.id, ...input });
  return NextResponse.json({ ...(await getStockingPlan(project.id)), caution: RULE_OF_THUMB_CAUTION });
});
