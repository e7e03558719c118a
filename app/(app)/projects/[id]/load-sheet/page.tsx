import type { Metadata } from "next";
import Link from "next/link";
import { format } from "date-fns";
import { requirePageUser } from "@/server/session";
import { projectSectionTitle, requirePageProject } from "@/server/page-project";
import { getDesign, getLatestApproval, getSurvey, getUnitSystem } from "@/db/queries/survey-design";
import { loadCheck } from "@/lib/survey/load-check";
import { validateDesign } from "@/lib/tank/design";
import { EmptyState } from "@/components/ui/empty-state";
import { buttonStyles } from "@/components/ui/button-styles";
import { LoadResults } from "../survey/_components/load-results";
import { DesignInputs, SurveyInputs } from "./design-inputs";
import { PrintButton } from "./print-button";

export const generateMetadata = ({ params }: { params: Promise<{ id: string }> }): Promise<Metadata> => projectSectionTitle(params, "Load-check sheet");

/** A printable record of the load check: inputs, figures, verdicts, sign-off and cautions. */
export default async function LoadSheetPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requirePageUser("lead", "crew");
  const { project } = await requirePageProject(id, user, "edit_survey");
  const [survey, design, approval, system] = await Promise.all([getSurvey(project.id), getDesign(project.id), getLatestApproval(project.id), getUnitSystem(user.id)]);

  if (!design || validateDesign(design.data).length > 0) {
    return (
      <EmptyState title="No tank design yet">
        Save a design under <Link href={`/projects/${project.id}/survey`} className={buttonStyles.quiet}>Site &amp; load</Link> to print its load check.
      </EmptyState>
    );
  }
  const results = loadCheck(design.data, survey?.data);
  const stamp = (d: Date) => format(d, "d MMM yyyy, HH:mm");

  return (
    <article className="mx-auto flex w-full max-w-4xl flex-col gap-5 rounded-2xl border border-line bg-card p-6 print:max-w-none print:border-0 print:p-0">
      <header className="flex flex-wrap items-start justify-between gap-3">
        <div>
          <h2 className="text-xl font-bold">Load-check sheet</h2>
          <p className="text-sm text-muted">
            {project.title} · {project.siteAddress} · design saved {stamp(design.updatedAt)} · printed {stamp(new Date())}
          </p>
        </div>
        <PrintButton />
      </header>

      <section aria-labelledby="sheet-approval" className="rounded-lg border border-line p-3 text-sm">
        <h3 id="sheet-approval" className="font-semibold">
          Sign-off
        </h3>
        {!approval ? (
          <p>Not approved yet.</p>
        ) : (
          <p data-testid="sheet-approval">
            {approval.revokedAt
              ? `Approval withdrawn by ${approval.revokedByName} on ${stamp(approval.revokedAt)}: ${approval.revokeReason}. `
              : approval.current
                ? "Approved for this design "
                : "Approved for an earlier design, not this one "}
            (by {approval.approvedByName} on {stamp(approval.approvedAt)}).
            {approval.engineerReference && ` Engineer's approval: ${approval.engineerReference}.`}
          </p>
        )}
      </section>

      <div className="grid gap-5 md:grid-cols-2 print:grid-cols-2">
        <section className="flex flex-col gap-2">
          <h3 className="text-sm font-semibold uppercase tracking-wide text-muted">Tank and stand</h3>
          <DesignInputs design={design.data} system={system} />
        </section>
        <section className="flex flex-col gap-2">
          <h3 className="text-sm font-semibold uppercase tracking-wide text-muted">Site</h3>
          <SurveyInputs survey={survey?.data ?? {}} system={system} />
          {survey && !survey.complete && <p className="text-sm text-caution">The survey is still a draft.</p>}
        </section>
      </div>

      <LoadResults results={results} system={system} twoColumns />
      <p className="text-xs text-muted">
        Floor rating: minimum uniformly distributed live loads, International Residential Code Table R301.5. Water density: Tanaka et al. (2001) for fresh water, EOS-80
        for salt water. Thresholds marked common practice are rules of thumb, not code figures.
      </p>
    </article>
  );
}
