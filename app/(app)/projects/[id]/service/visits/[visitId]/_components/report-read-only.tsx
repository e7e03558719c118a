import Link from "next/link";
import type { VisitReportView } from "@/db/queries/visit-reports";
import { waterTestLine } from "@/lib/mail/visit-report-email";

/** A report as read after sign-off (and by the client). Internal notes come only when `team`. */
export function ReportReadOnly({ projectId, report, team }: { projectId: string; report: VisitReportView; team: boolean }) {
  const done = report.tasks.filter((t) => t.done);
  const notDone = report.tasks.filter((t) => !t.done);
  const test = report.waterTest ? waterTestLine(report.waterTest) : null;
  return (
    <div className="flex flex-col gap-4 rounded-2xl border border-line bg-card p-5 text-sm" data-testid="visit-report">
      <div>
        <h3 className="font-semibold">Done</h3>
        {done.length ? (
          <ul className="mt-1 list-disc pl-5">
            {done.map((t) => (
              <li key={t.index}>{t.label}</li>
            ))}
          </ul>
        ) : (
          <p className="text-muted">No tasks ticked.</p>
        )}
        {notDone.length > 0 && <p className="mt-1 text-muted">Not done this time: {notDone.map((t) => t.label).join("; ")}</p>}
      </div>
      {report.waterChangeL != null && <p>Water changed: {report.waterChangeL} L</p>}
      {test && <p>Water test: {test}</p>}
      {report.equipmentServiced.length > 0 && <p>Equipment serviced: {report.equipmentServiced.map((e) => [e.kind, e.makeModel].filter(Boolean).join(" ")).join("; ")}</p>}
      {report.livestockNote && (
        <p>
          Fish and livestock: {report.livestockNote}
          {report.hasLivestockRecord && (
            <>
              {" "}
              <Link className="font-semibold text-accent hover:underline" href={`/projects/${projectId}/fish`}>
                See the livestock record
              </Link>
            </>
          )}
        </p>
      )}
      {report.clientNotes && <p className="whitespace-pre-wrap">Notes: {report.clientNotes}</p>}
      {team && report.internalNotes && <p className="whitespace-pre-wrap rounded-lg bg-paper p-3">Internal (team only): {report.internalNotes}</p>}
      {report.photos.length > 0 && (
        <div className="flex flex-wrap gap-2">
          {report.photos.map((p) => (
            // eslint-disable-next-line @next/next/no-img-element -- photos stream through the app's checked route
            <img key={p.id} src={`/api/attachments/${p.id}?variant=thumb`} alt={p.caption ?? p.fileName} className="h-24 w-24 rounded-lg object-cover" />
          ))}
        </div>
      )}
    </div>
  );
}
