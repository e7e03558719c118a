import type { ReactNode } from "react";
import { requirePageUser } from "@/server/session";
import { requirePageProject } from "@/server/page-project";
import { getProjectPeople } from "@/db/queries/project-page";
import { ProgressTrack } from "@/components/ui/progress-track";
import { StageBadge } from "@/components/ui/stage-badge";
import { ProjectTabs } from "./_components/project-tabs";
import { projectTabsFor } from "./_components/project-sections";

/** The project's header and section tabs. Each section page checks access again for itself. */
export default async function ProjectLayout({ children, params }: { children: ReactNode; params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requirePageUser();
  const { project } = await requirePageProject(id, user);
  const people = await getProjectPeople(project);
  return (
    <div className="flex flex-col gap-6">
      <header className="flex flex-col gap-3 rounded-2xl border border-line bg-card p-5 print:hidden">
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
        <ProjectTabs tabs={projectTabsFor(project.id, user.role)} />
      </header>
      {children}
    </div>
  );
}
