import type { Metadata } from "next";
import Link from "next/link";
import { requirePageUser } from "@/server/session";
import { requirePageProject } from "@/server/page-project";
import { getDesign, getLatestApproval, getSurvey, getUnitSystem } from "@/db/queries/survey-design";
import { loadCheck } from "@/lib/survey/load-check";
import { getCompanyFloorCode } from "@/db/queries/company-settings";
import { staleApprovalReason } from "@/lib/stages/gates";
import { validateDesign } from "@/lib/tank/design";
import { UnitToggle } from "@/components/ui/unit-toggle";
import { buttonStyles } from "@/components/ui/button-styles";
import { SurveyForm } from "./_components/survey-form";
import { DesignForm } from "./_components/design-form";
import { ApprovalPanel } from "./_components/approval-panel";

export const metadata: Metadata = { title: "Site & load" };

/** The site survey, the tank design with its load check, and the lead's sign-off. */
export default async function SiteLoadPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requirePageUser("lead", "crew");
  const { project } = await requirePageProject(id, user, "edit_survey");
  const [survey, design, approval, system, floorCode] = await Promise.all([
    getSurvey(project.id),
    getDesign(project.id),
    getLatestApproval(project.id),
    getUnitSystem(user.id),
    getCompanyFloorCode(),
  ]);
  const results = design && validateDesign(design.data).length === 0 ? loadCheck(design.data, survey?.data, floorCode) : null;

  return (
    <div className="flex flex-col gap-5">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <p className="text-sm text-muted">
          Survey: {survey ? (survey.complete ? "complete" : "draft") : "not started"} · Design: {design ? "saved" : "not saved yet"}
        </p>
        <div className="flex flex-wrap items-center gap-3">
          <UnitToggle value={system} />
          {design && (
            <Link href={`/projects/${project.id}/load-sheet`} className={buttonStyles.secondary}>
              Load-check sheet
            </Link>
          )}
        </div>
      </div>
      <SurveyForm projectId={project.id} stored={survey?.data ?? null} system={system} />
      <DesignForm projectId={project.id} stored={design?.data ?? null} survey={survey?.data ?? null} system={system} floorCode={floorCode} />
      <ApprovalPanel
        projectId={project.id}
        isLead={user.role === "lead"}
        approval={
          approval && {
            approvedAt: approval.approvedAt.toISOString(),
            approvedByName: approval.approvedByName,
            engineerReference: approval.engineerReference,
            current: approval.current,
            staleReason: approval.current ? null : staleApprovalReason(approval.staleWhy),
            revokedAt: approval.revokedAt?.toISOString() ?? null,
            revokedByName: approval.revokedByName,
            revokeReason: approval.revokeReason,
          }
        }
        designUpdatedAt={design?.updatedAt.toISOString() ?? null}
        surveyComplete={!!survey?.complete}
        needsEngineer={!!results?.needsEngineerReference}
        glassOk={results ? results.glass.ok : true}
      />
    </div>
  );
}
