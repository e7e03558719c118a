import type { Metadata } from "next";
import Link from "next/link";
import { format } from "date-fns";
import { requirePageUser } from "@/server/session";
import { projectSectionTitle, requirePageProject } from "@/server/page-project";
import { getDesign, getLatestApproval, getSurvey, getUnitSystem } from "@/db/queries/survey-design";
import { loadCheck } from "@/lib/survey/load-check";
import { getCompanyFloorCode } from "@/db/queries/company-settings";
import { getSheetParties } from "@/db/queries/load-sheet";
import { staleApprovalReason } from "@/lib/stages/gates";
import { FLOOR_CODE_VALUES } from "@/lib/tank/floor-codes";
import { validateDesign } from "@/lib/tank/design";
import { EmptyState } from "@/components/ui/empty-state";
import { buttonStyles } from "@/components/ui/button-styles";
import { LoadResults } from "../survey/_components/load-results";
import { DesignInputs, SurveyInputs } from "./design-inputs";
import { PrintButton } from "@/components/ui/print-button";

export const generateMetadata = ({ params }: { params: Promise<{ id: string }> }): Promise<Metadata> => projectSectionTitle(params, "Load-check sheet");

/** A printable record of the load check: inputs, figures, verdicts, sign-off and cautions. */
export default async function LoadSheetPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requirePageUser("lead", "crew");
  const { project } = await requirePageProject(id, user, "edit_survey");
  const [survey, design, approval, system, floorCode, parties] = await Promise.all([
    getSurvey(project.id),
    getDesign(project.id),
    getLatestApproval(project.id),
    getUnitSystem(user.id),
    getCompanyFloorCode(),
    getSheetParties(project.clientId),
  ]);

  if (!design || validateDesign(design.data).length > 0) {
    return (
      <EmptyState title="No tank design yet">
        Save a design under <Link href={`/projects/${project.id}/survey`} className={buttonStyles.quiet}>Site &amp; load</Link> to print its load check.
      </EmptyState>
    );
  }
  const results = loadCheck(design.data, survey?.data, floorCode);
  const stamp = (d: Date) => format(d, "d MMM yyyy, HH:mm");
  const today = format(new Date(), "d MMM yyyy");

  return (
    <article className="mx-auto flex w-full max-w-4xl flex-col gap-5 rounded-2xl border border-line bg-card p-6 print:max-w-none print:border-0 print:p-0">
      <header className="flex flex-wrap items-start justify-between gap-3 border-b border-line pb-3">
        <div>
          <p className="text-sm font-semibold" data-testid="sheet-company">
            {parties.company?.name ?? "Company name not set"}
            {parties.company && <span className="font-normal text-muted"> · {[parties.company.email, parties.company.phone].filter(Boolean).join(" · ")}</span>}
          </p>
          <h2 className="text-xl font-bold">Load-check sheet</h2>
          <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-3 text-sm" data-testid="sheet-parties">
            <dt className="text-muted">Project</dt>
            <dd>{project.title}</dd>
            <dt className="text-muted">Client</dt>
            <dd>{parties.client ? `${parties.client.name} (${parties.client.email})` : "—"}</dd>
            <dt className="text-muted">Site</dt>
            <dd>{project.siteAddress}</dd>
            <dt className="text-muted">Date</dt>
            <dd>
              {today} · design saved {stamp(design.updatedAt)}
            </dd>
            <dt className="text-muted">Floor code</dt>
            <dd>
              {FLOOR_CODE_VALUES[floorCode].name} ({FLOOR_CODE_VALUES[floorCode].liveLoadSource})
            </dd>
          </dl>
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
                : `No longer stands: ${staleApprovalReason(approval.staleWhy)} Approved `}
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
        Water density: Tanaka et al. (2001) for fresh water, EOS-80 for salt water. Floor and glass sources are given beside each result. Thresholds marked common
        practice are rules of thumb, not code figures; values marked from memory are to be checked against the published tables.
      </p>

      <section aria-labelledby="sheet-signatures" className="grid gap-6 pt-4 sm:grid-cols-2 print:grid-cols-2 break-inside-avoid" data-testid="sheet-signatures">
        <h3 id="sheet-signatures" className="sr-only">
          Signatures
        </h3>
        {["Project lead", "Structural engineer"].map((who) => (
          <div key={who} className="flex flex-col gap-6 text-sm">
            <p className="font-semibold">{who}</p>
            <p className="border-b border-ink/60 pb-1">Name</p>
            <p className="border-b border-ink/60 pb-1">Signature</p>
            <p className="border-b border-ink/60 pb-1">Date</p>
          </div>
        ))}
      </section>
    </article>
  );
}
