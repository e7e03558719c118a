import type { Metadata } from "next";
import Link from "next/link";
import { requirePageUser } from "@/server/session";
import { projectSectionTitle, requirePageProject } from "@/server/page-project";
import { assignablePeople, companyTimeZone, getServicePlan, getServiceTaskTemplate, listServiceVisits } from "@/db/queries/service-plans";
import { canOnProject } from "@/lib/auth/permissions";
import { describeRecurrence, parseRule } from "@/lib/service/recurrence";
import { DEFAULT_SERVICE_TASKS } from "@/lib/service/default-tasks";
import { groupServiceVisits } from "@/lib/service/visit-groups";
import { PlanForm } from "./_components/plan-form";
import { VisitRowActions } from "./_components/visit-row-actions";

export const generateMetadata = ({ params }: { params: Promise<{ id: string }> }): Promise<Metadata> => projectSectionTitle(params, "Service");
export const dynamic = "force-dynamic";

const fmt = (d: Date, tz: string) => new Intl.DateTimeFormat("en-GB", { timeZone: tz, weekday: "short", day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit" }).format(d);

/** A tank's routine care: the plan, the coming visits and the reports of past ones. */
export default async function ServicePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requirePageUser();
  const { project, relation } = await requirePageProject(id, user);
  const lead = canOnProject(relation, "manage_service");
  const team = canOnProject(relation, "view_internal");
  const [plan, visits, tz] = await Promise.all([getServicePlan(project.id), listServiceVisits(project.id).then((list) => ({ list, now: new Date() })), companyTimeZone()]);
  const [template, people] = lead ? await Promise.all([getServiceTaskTemplate(), assignablePeople(project.id)]) : [[], []];
  const { upcoming, overdue, past, skipped } = groupServiceVisits(visits.list, visits.now);
  const recurrence = plan ? parseRule(plan.rule) : null;
  const reportLink = (visitId: string) => `/projects/${project.id}/service/visits/${visitId}`;

  return (
    <section aria-labelledby="service-heading" className="flex max-w-3xl flex-col gap-5">
      <h2 id="service-heading" className="text-lg font-semibold">
        Service
      </h2>
      {project.stage !== "in_service" && project.stage !== "first_stocking" && (
        <p className="text-sm text-muted">Routine visits usually start once the tank is in service.</p>
      )}
      <div className="rounded-2xl border border-line bg-card p-5" data-testid="service-plan">
        <h3 className="font-semibold">Plan</h3>
        {plan && recurrence ? (
          <div className="mt-2 flex flex-col gap-1 text-sm">
            <p>
              {`${describeRecurrence(recurrence)} at ${plan.startTime} (${tz}), from ${plan.startsOn}; about ${plan.durationMinutes} minutes.`}
            </p>
            <p>{`Water change: ${plan.waterChangePercent} % of the tank's water at each visit.`}</p>
            {plan.tasks.length > 0 && (
              <>
                <p>A routine visit includes:</p>
                <ul className="list-disc pl-5">
                  {plan.tasks.map((t) => (
                    <li key={t}>{t}</li>
                  ))}
                </ul>
              </>
            )}
          </div>
        ) : (
          <p className="mt-2 text-sm text-muted">No service plan yet.</p>
        )}
        {lead && (
          <PlanForm
            projectId={project.id}
            people={people.map((p) => ({ id: p.id, name: p.name }))}
            initial={
              plan
                ? {
                    recurrence,
                    startsOn: plan.startsOn,
                    startTime: plan.startTime,
                    durationMinutes: plan.durationMinutes,
                    waterChangePercent: plan.waterChangePercent,
                    tasks: plan.tasks,
                    usualAssigneeId: plan.usualAssigneeId,
                    version: plan.version,
                  }
                : { recurrence: null, startsOn: new Date().toISOString().slice(0, 10), startTime: "09:00", durationMinutes: 90, waterChangePercent: 20, tasks: template.length ? template : [...DEFAULT_SERVICE_TASKS], usualAssigneeId: null, version: null }
            }
          />
        )}
      </div>

      {overdue.length > 0 && team && (
        <div className="rounded-2xl border border-danger/40 bg-card p-5">
          <h3 className="font-semibold text-danger">Overdue: no report yet</h3>
          <ul className="mt-2 flex flex-col gap-2 text-sm">
            {overdue.map((v) => (
              <li key={v.id}>
                <Link className="font-semibold text-accent hover:underline" href={reportLink(v.id)}>
                  {fmt(v.startsAt, tz)}
                </Link>{" "}
                {v.assigneeName && `· ${v.assigneeName}`}
              </li>
            ))}
          </ul>
        </div>
      )}

      <div className="rounded-2xl border border-line bg-card p-5" data-testid="upcoming-visits">
        <h3 className="font-semibold">Next visits</h3>
        {upcoming.length ? (
          <ul className="mt-2 flex flex-col gap-3 text-sm">
            {upcoming.map((v) => (
              <li key={v.id} className="flex flex-col gap-1" data-testid="upcoming-visit">
                <span>
                  {team ? (
                    <Link className="font-semibold text-accent hover:underline" href={reportLink(v.id)}>
                      {fmt(v.startsAt, tz)}
                    </Link>
                  ) : (
                    <span className="font-semibold">{fmt(v.startsAt, tz)}</span>
                  )}
                  {v.assigneeName && ` · ${v.assigneeName}`}
                  {v.moved && " · moved"}
                </span>
                {lead && <VisitRowActions projectId={project.id} visit={{ id: v.id, startsAt: v.startsAt.toISOString(), assignedTo: v.assignedTo }} people={people.map((p) => ({ id: p.id, name: p.name }))} />}
              </li>
            ))}
          </ul>
        ) : (
          <p className="mt-2 text-sm text-muted">No visits booked ahead.</p>
        )}
        {team && skipped.length > 0 && (
          <p className="mt-3 text-xs text-muted">
            Skipped: {skipped.map((v) => `${fmt(v.startsAt, tz)} (${v.cancelReason})`).join("; ")}
          </p>
        )}
      </div>

      <div className="rounded-2xl border border-line bg-card p-5" data-testid="past-reports">
        <h3 className="font-semibold">Reports</h3>
        {past.length ? (
          <ul className="mt-2 flex flex-col gap-2 text-sm">
            {past.map((v) => (
              <li key={v.id}>
                <Link className="font-semibold text-accent hover:underline" href={reportLink(v.id)}>
                  {fmt(v.startsAt, tz)}
                </Link>
                {v.assigneeName && ` · ${v.assigneeName}`}
              </li>
            ))}
          </ul>
        ) : (
          <p className="mt-2 text-sm text-muted">No signed-off visits yet.</p>
        )}
      </div>
    </section>
  );
}
