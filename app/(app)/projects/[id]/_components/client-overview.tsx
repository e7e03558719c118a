import type { ProjectRow } from "@/db/queries/project-access";
import type { SessionUser } from "@/server/session";
import { summarizeForClient } from "@/db/queries/client-home";
import { getClientTimeline } from "@/db/queries/client-timeline";
import { listVisits } from "@/db/queries/visits";
import { NextStep } from "@/app/(app)/portal/_components/next-step";
import { WaterWords } from "@/app/(app)/portal/_components/water-words";
import { ClientActions } from "@/app/(app)/portal/_components/client-actions";
import { ProjectPeople } from "@/app/(app)/portal/_components/project-people";
import { PhotoStrip } from "@/app/(app)/portal/_components/photo-strip";
import { VisitList } from "@/app/(app)/portal/_components/visit-list";
import { ClientTimeline } from "@/app/(app)/portal/_components/client-timeline";
import { ProblemPhotoForm } from "@/app/(app)/portal/_components/problem-photo-form";

/** What a client sees first on their project: where it stands, what's next, and what has happened. */
export async function ClientOverview({ project }: { project: ProjectRow; user: SessionUser }) {
  const [summary, timeline, visits] = await Promise.all([summarizeForClient(project), getClientTimeline(project.id), listVisits(project.id)]);
  return (
    <div className="grid gap-6 lg:grid-cols-[3fr_2fr]">
      <div className="flex flex-col gap-6">
        <section aria-labelledby="next-heading" className="flex flex-col gap-3 rounded-2xl border border-line bg-card p-5">
          <h2 id="next-heading" className="text-lg font-semibold">
            Where things stand
          </h2>
          <NextStep next={summary.next} />
          <WaterWords water={summary.water} stage={project.stage} />
          <ClientActions projectId={project.id} stage={project.stage} />
        </section>
        <ProblemPhotoForm projectId={project.id} stage={project.stage} />
        <section aria-labelledby="timeline-heading" className="flex flex-col gap-3">
          <h2 id="timeline-heading" className="text-lg font-semibold">
            Timeline
          </h2>
          <ClientTimeline entries={timeline} />
        </section>
      </div>
      <div className="flex flex-col gap-6">
        <section aria-labelledby="visits-heading" className="flex flex-col gap-3">
          <h2 id="visits-heading" className="text-lg font-semibold">
            Visits
          </h2>
          <VisitList visits={visits} />
        </section>
        <section aria-labelledby="photos-heading" className="flex flex-col gap-3">
          <h2 id="photos-heading" className="text-lg font-semibold">
            Recent photos
          </h2>
          <PhotoStrip photos={summary.photos} projectId={project.id} />
        </section>
        <section aria-labelledby="people-heading" className="flex flex-col gap-3">
          <h2 id="people-heading" className="text-lg font-semibold">
            Your project team
          </h2>
          <ProjectPeople lead={summary.people.lead} crew={summary.people.crew} />
        </section>
      </div>
    </div>
  );
}
