import type { Metadata } from "next";
import { requirePageUser } from "@/server/session";
import { requirePageProject } from "@/server/page-project";
import { getStageTimeline } from "@/db/queries/project-page";
import { StageTimeline } from "./_components/stage-timeline";

export const metadata: Metadata = { title: "Project" };

export default async function ProjectOverviewPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requirePageUser();
  const { project } = await requirePageProject(id, user);
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
