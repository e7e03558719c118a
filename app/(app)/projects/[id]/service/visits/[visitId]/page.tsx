import type { Metadata } from "next";
import Link from "next/link";
import { requirePageUser } from "@/server/session";
import { projectSectionTitle, requirePageProject } from "@/server/page-project";
import { getVisitReport } from "@/db/queries/visit-reports";
import { listVisitEquipment } from "@/db/queries/visit-equipment";
import { canOnProject } from "@/lib/auth/permissions";
import { mayEditReport } from "@/lib/service/sign-off";
import { parseId } from "@/server/ids";
import { AppError } from "@/server/errors";
import { notFound } from "next/navigation";
import { signerOf } from "@/app/api/projects/[id]/service/signer";
import { ReportReadOnly } from "./_components/report-read-only";
import { VisitReportForm } from "./_components/visit-report-form";
import { ReopenForm } from "./_components/reopen-form";

export const generateMetadata = ({ params }: { params: Promise<{ id: string }> }): Promise<Metadata> => projectSectionTitle(params, "Visit report");
export const dynamic = "force-dynamic";

const when = (d: Date, tz: string) => new Intl.DateTimeFormat("en-GB", { timeZone: tz, weekday: "long", day: "numeric", month: "long", hour: "2-digit", minute: "2-digit" }).format(d);

/** One service visit's report: filled in on a phone by the crew, read by the client once signed off. */
export default async function VisitReportPage({ params }: { params: Promise<{ id: string; visitId: string }> }) {
  const { id, visitId } = await params;
  const user = await requirePageUser();
  const { project, relation } = await requirePageProject(id, user);
  const team = canOnProject(relation, "view_internal");
  let report;
  try {
    report = await getVisitReport({ projectId: project.id, visitId: parseId(visitId, "That visit"), audience: team ? "team" : "client" });
  } catch (error) {
    if (error instanceof AppError && error.status === 404) notFound();
    throw error;
  }
  const who = signerOf(relation);
  const editable = team && mayEditReport(who, report.visit);
  const equipment = editable ? await listVisitEquipment(project.id, report.visit.id) : [];
  return (
    <section aria-labelledby="visit-heading" className="flex max-w-xl flex-col gap-4">
      <Link href={`/projects/${project.id}/service`} className="text-sm font-semibold text-accent hover:underline">
        ← Service
      </Link>
      <div>
        <h2 id="visit-heading" className="text-lg font-semibold">
          Visit on {when(report.visit.startsAt, report.timeZone)}
        </h2>
        <p className="text-sm text-muted">
          {report.visit.assigneeName ? `With ${report.visit.assigneeName}` : "Nobody assigned yet"}
          {report.visit.completedAt && ` · signed off${report.signedOffByName ? ` by ${report.signedOffByName}` : ""}`}
          {report.visit.cancelledAt && ` · skipped: ${report.visit.cancelReason}`}
        </p>
        {team && report.reopenedAt && report.reopenReason && <p className="mt-1 text-sm text-caution">Reopened: {report.reopenReason}</p>}
      </div>
      {editable ? (
        <VisitReportForm
          projectId={project.id}
          report={JSON.parse(JSON.stringify(report))}
          equipment={equipment.map((e) => ({ id: e.id, label: [e.kind, e.makeModel].filter(Boolean).join(" · "), serviced: e.servicedOnVisit }))}
        />
      ) : (
        <ReportReadOnly projectId={project.id} report={report} team={team} />
      )}
      {user.role === "lead" && report.visit.completedAt && <ReopenForm projectId={project.id} visitId={report.visit.id} />}
    </section>
  );
}
