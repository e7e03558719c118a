import { NextResponse } from "next/server";
import { projectRoute } from "@/server/route";
import { getSurvey, saveSurvey } from "@/db/queries/survey-design";
import { siteSurveySchema } from "@/lib/survey/site-survey.schema";
import { SURVEY_FIELD_LABELS, surveyMissingFields } from "@/lib/survey/survey-missing";

export const GET = projectRoute({ action: "edit_survey" }, async ({ project }) => {
  const survey = await getSurvey(project.id);
  const missing = surveyMissingFields(survey?.data);
  return NextResponse.json({ survey: survey?.data ?? null, complete: survey?.complete ?? false, missing });
});

/**
 * Saves the survey whole. A half-done survey is kept as a draft; it is marked complete only when
 * every required field is filled in, which is what lets the project into the load check.
 */
export const PUT = projectRoute({ action: "edit_survey", schema: siteSurveySchema }, async ({ input: data, project, user }) => {
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
