import { NextResponse } from "next/server";
import { projectRoute } from "@/server/route";
import { AppError, conflict, unprocessable } from "@/server/errors";
import { approveLoad, getLatestApproval, getSurvey } from "@/db/queries/survey-design";
import { loadCheck } from "@/lib/survey/load-check";
import { validateDesign } from "@/lib/tank/design";
import { approveLoadSchema } from "./load-approval.schema";
import { revokeApproval } from "./revoke-approval";

export const GET = projectRoute({ action: "edit_survey" }, async ({ project }) => {
  return NextResponse.json({ approval: await getLatestApproval(project.id) });
});

/**
 * The lead signs the load check off for the design exactly as stored now. Over the floor's rated
 * load, the engineer's approval reference is required.
 */
export const POST = projectRoute({ action: "approve_load", schema: approveLoadSchema }, async ({ input, project, user }) => {
  const survey = await getSurvey(project.id);
  if (!survey?.complete) throw unprocessable("Finish the site survey first: the floor screening needs the room, floor and access details.");
  const engineerReference = input.engineerReference?.trim() || null;
  const outcome = await approveLoad({
    projectId: project.id,
    userId: user.id,
    engineerReference,
    expectedUpdatedAt: input.designUpdatedAt ?? undefined,
    decide: (design) => {
      const problems = validateDesign(design);
      if (problems.length) return { refused: `The saved design has problems to fix first: ${problems.map((p) => p.message).join(" ")}` };
      const results = loadCheck(design, survey.data);
      if (!results.glass.ok) return { refused: "A panel is thinner than the water pressure needs. Change the panel thickness before approving." };
      if (results.needsEngineerReference && !engineerReference) {
        return {
          refused: "The tank is over the floor's rated load: enter the structural engineer's approval (name, firm, date and reference) before approving.",
          field: "engineerReference",
        };
      }
      return { results };
    },
  });
  if (!outcome.ok) {
    if (outcome.reason === "refused") throw new AppError(422, outcome.message, outcome.field ? { [outcome.field]: outcome.message } : undefined);
    if (outcome.reason === "no design") throw unprocessable("Save a tank design first: there is nothing to approve yet.");
    if (outcome.reason === "design changed") throw conflict("The design was changed since you opened it. Look at the new figures, then approve again.");
    throw conflict("The load check is already approved for this design.");
  }
  return NextResponse.json({ approval: await getLatestApproval(project.id) }, { status: 201 });
});

/** Withdraws the approval with a reason; the record stays. */
export const DELETE = revokeApproval;
