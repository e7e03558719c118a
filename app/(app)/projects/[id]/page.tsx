import type { Metadata } from "next";
import { requirePageUser } from "@/server/session";
import { requirePageProject } from "@/server/page-project";
import { getProjectPeople, getStageTimeline } from "@/db/queries/project-page";
import { ProgressTrack } from "@/components/ui/progress-track";
import { StageBadge } from "@/components/ui/stage-badge";
import { StageTimeline } from "./_components/stage-timeline";

export const metadata: Metadata = { title: "Project" };

export default async function ProjectPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requirePageUser();
  const { project } = await requirePageProject(id, user);
  const [people, timeline] = await Promise.all([getProjectPeople(project), getStageTimeline(project.id)]);
  return (
    <div className="flex flex-col gap-6">
      <header className="flex flex-col gap-3 rounded-2xl border border-line bg-card p-5">
        <div className="flex flex-wrap items-center gap-3">
          <h1 className="text-2xl font-bold tracking-tight">{project.title}</h1>
          <StageBadge stage={project.stage} />
        </div>
        <p className="text-sm text-muted">
          {project.siteAddress}
          {people.client && ` · for ${people.client.name}`}
          {project.tankSummary && ` · ${project.tankSummary}`}
        </p>
        <ProgressTrack stage={project.stage} />
      </header>
      <section aria-labelledby="timeline-heading" className="flex flex-col gap-3">
        <h2 id="timeline-heading" className="text-lg font-semibold">
          Timeline
        </h2>
        <StageTimeline events={timeline} />
      </section>
    </div>
  );
}
