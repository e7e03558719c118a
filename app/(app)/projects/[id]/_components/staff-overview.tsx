import { format } from "date-fns";
import type { ProjectRow } from "@/db/queries/project-access";
import type { SessionUser } from "@/server/session";
import { getProjectPeople, getStageTimeline } from "@/db/queries/project-page";
import { loadGateFacts } from "@/db/queries/gate-facts";
import { nextStageNeeds } from "@/lib/stages/gates";
import { STAGE_LABELS, nextStage } from "@/lib/stages/stages";
import { daysSince } from "@/lib/stages/board-filters";
import { StageTimeline } from "./stage-timeline";

const day = (d: string | null) => (d ? format(new Date(`${d}T12:00:00Z`), "d MMM yyyy") : "Not set");

/** What the lead and crew see first on a project: what the next stage needs, dates, people, timeline. */
export async function StaffOverview({ project }: { project: ProjectRow; user: SessionUser }) {
  const now = new Date();
  const [timeline, people, facts] = await Promise.all([
    getStageTimeline(project.id),
    getProjectPeople(project),
    loadGateFacts([project.id], { cycleIds: project.stage === "cycling" ? [project.id] : [], now }),
  ]);
  const f = facts.get(project.id);
  const needs = f ? nextStageNeeds(project.stage, f) : null;
  const next = nextStage(project.stage);
  const inStage = daysSince(project.stageEnteredAt.toISOString(), now);
  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_20rem]">
      <div className="flex flex-col gap-6">
        <section aria-labelledby="next-heading" className="rounded-2xl border border-line bg-card p-4" data-testid="next-stage-needs">
          <h2 id="next-heading" className="text-lg font-semibold">
            {next ? `What ${STAGE_LABELS[next]} needs` : "In service"}
          </h2>
          {!next ? (
            <p className="mt-1 text-sm text-muted">This is the last stage: the tank is handed over and looked after.</p>
          ) : needs && needs.length ? (
            <ul className="mt-2 flex flex-col gap-1 text-sm">
              {needs.map((r) => (
                <li key={r} className="rounded bg-caution-soft px-2 py-1 text-caution">
                  {r}
                </li>
              ))}
            </ul>
          ) : (
            <p className="mt-1 rounded bg-ok-soft px-2 py-1 text-sm font-semibold text-ok">Ready to move to {STAGE_LABELS[next]}.</p>
          )}
        </section>
        <section aria-labelledby="timeline-heading" className="flex flex-col gap-3">
          <h2 id="timeline-heading" className="text-lg font-semibold">
            Timeline
          </h2>
          <StageTimeline events={timeline} />
        </section>
      </div>
      <aside className="flex flex-col gap-4">
        <section aria-labelledby="dates-heading" className="rounded-2xl border border-line bg-card p-4 text-sm">
          <h2 id="dates-heading" className="mb-2 font-semibold">
            Key dates
          </h2>
          <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1">
            <dt className="text-muted">In {STAGE_LABELS[project.stage]}</dt>
            <dd>{inStage === 0 ? "since today" : `${inStage} ${inStage === 1 ? "day" : "days"}`}</dd>
            <dt className="text-muted">Target install</dt>
            <dd>{day(project.targetInstallDate)}</dd>
            <dt className="text-muted">Target handover</dt>
            <dd>{day(project.targetHandoverDate)}</dd>
            <dt className="text-muted">Created</dt>
            <dd>{format(project.createdAt, "d MMM yyyy")}</dd>
          </dl>
        </section>
        <section aria-labelledby="people-heading" className="rounded-2xl border border-line bg-card p-4 text-sm">
          <h2 id="people-heading" className="mb-2 font-semibold">
            People
          </h2>
          <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1">
            <dt className="text-muted">Client</dt>
            <dd>
              {people.client ? (
                <>
                  {people.client.name}
                  <span className="block text-xs text-muted">{[people.client.email, people.client.phone].filter(Boolean).join(" · ")}</span>
                </>
              ) : (
                "—"
              )}
            </dd>
            <dt className="text-muted">Lead</dt>
            <dd>{people.lead?.name ?? "No lead yet"}</dd>
            <dt className="text-muted">Crew</dt>
            <dd>{people.crew.length ? people.crew.map((c) => c.name).join(", ") : "Nobody assigned yet"}</dd>
          </dl>
        </section>
      </aside>
    </div>
  );
}
