import { NextResponse } from "next/server";
import { route, parseJson } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { getSurvey, saveSurvey } from "@/db/queries/survey-design";
import { siteSurveySchema } from "@/lib/survey/site-survey.schema";
import { SURVEY_FIELD_LABELS, surveyMissingFields } from "@/lib/survey/survey-missing";

type Params = { id: string };

export const GET = route<Params>(async (_req, ctx) => {
  const { id } = await ctx.params;
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "edit_survey" });
  const survey = await getSurvey(project.id);
  const missing = surveyMissingFields(survey?.data);
  return NextResponse.json({ survey: survey?.data ?? null, complete: survey?.complete ?? false, missing });
});

/**
 * Saves the survey whole. A half-done survey is kept as a draft; it is marked complete only when
 * every required field is filled in, which is what lets the project into the load check.
 */
export const PUT = route<Params>(async (req, ctx) => {
  const { id } = await ctx.params;
  const data = await parseJson(req, siteSurveySchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "edit_survey" });
  const missing = surveyMissingFields(data);
  const row = await saveSurvey({ projectId: project.id, data, complete: missing.length === 0, userId: user.id });
  return NextResponse.json({
    survey: row.data,
    complete: row.complete,
    missing,
    missingLabels: missing.map((f) => SURVEY_FIELD_LABELS[f]),
    updatedAt: row.updatedAt,
  });
});
