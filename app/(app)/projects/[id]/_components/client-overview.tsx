import type { ProjectRow } from "@/db/queries/project-access";
import type { SessionUser } from "@/server/session";
import { getStageTimeline } from "@/db/queries/project-page";
import { StageTimeline } from "./stage-timeline";

/** What a client sees first on their project. */
export async function ClientOverview({ project }: { project: ProjectRow; user: SessionUser }) {
  const timeline = await getStageTimeline(project.id);
  return (
    <section aria-labelledby="timeline-heading" className="flex flex-col gap-3">
      <h2 id="timeline-heading" className="text-lg font-semibold">
        Timeline
      </h2>
      <StageTimeline events={timeline} />
    </section>
  );
}
