import { NextResponse } from "next/server";
import { projectRoute } from "@/server/route";
import { getServicePlan, saveServicePlan } from "@/db/queries/service-plans";
import { ruleBody } from "@/lib/service/recurrence";
import { planSchema } from "../service.schema";

/** The tank's plan: everyone on the project reads it. */
export const GET = projectRoute({ action: "view" }, async ({ project }) => NextResponse.json({ plan: await getServicePlan(project.id) }));

/** The lead creates or changes the plan; its coming visits are written out in the same transaction. */
export const PUT = projectRoute({ action: "manage_service", schema: planSchema }, async ({ input, project, user }) => {
  const rule = ruleBody(input.frequency === "weekly" ? { kind: "weekly", everyWeeks: input.everyWeeks, weekday: input.weekday } : { kind: "monthly", dayOfMonth: input.dayOfMonth });
  const { plan, added, replaced } = await saveServicePlan({
    projectId: project.id,
    by: user.id,
    input: {
      rule,
      startsOn: input.startsOn,
      startTime: input.startTime,
      durationMinutes: input.durationMinutes,
      waterChangePercent: input.waterChangePercent,
      tasks: input.tasks,
      usualAssigneeId: input.usualAssigneeId,
      version: input.version ?? null,
    },
  });
  return NextResponse.json({ plan, added, replaced });
});
