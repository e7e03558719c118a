import { NextResponse } from "next/server";
import { projectRoute } from "@/server/route";
import { getDesign, getSurvey, saveDesign } from "@/db/queries/survey-design";
import { tankDesignSchema } from "@/lib/survey/tank-design.schema";
import { loadCheck, type StoredDesign } from "@/lib/survey/load-check";

export const GET = projectRoute({ action: "edit_survey" }, async ({ project }) => {
  const [design, survey] = await Promise.all([getDesign(project.id), getSurvey(project.id)]);
  return NextResponse.json({
    design: design?.data ?? null,
    updatedAt: design?.updatedAt ?? null,
    results: design ? loadCheck(design.data, survey?.data) : null,
  });
});

/**
 * Saves the tank design in SI. The schema runs lib/tank's validateDesign, so an impossible design
 * is a 400 with a message per field and nothing is stored. A tank too big for the room or the door
 * is saved, with warnings: that is for the people planning the install to decide.
 */
export const PUT = projectRoute({ action: "edit_survey", schema: tankDesignSchema }, async ({ input, project, user }) => {
  const design = input as StoredDesign;
  const saved = await saveDesign({ projectId: project.id, data: design, userId: user.id });
  const survey = await getSurvey(project.id);
  const results = loadCheck(saved.data, survey?.data);
  return NextResponse.json({ design: saved.data, updatedAt: saved.updatedAt, results, warnings: results.siteWarnings });
});
