import type { Metadata } from "next";
import Link from "next/link";
import { requirePageUser } from "@/server/session";
import { listVisibleProjects } from "@/db/queries/project-list";
import { ProgressTrack } from "@/components/ui/progress-track";
import { StageBadge } from "@/components/ui/stage-badge";
import { EmptyState } from "@/components/ui/empty-state";

export const metadata: Metadata = { title: "My projects" };

export default async function PortalPage() {
  const user = await requirePageUser("client");
  const projects = await listVisibleProjects(user);
  return (
    <div className="mx-auto flex max-w-3xl flex-col gap-4">
      <h1 className="text-2xl font-bold tracking-tight">Your aquarium projects</h1>
      {projects.length === 0 ? (
        <EmptyState title="No projects yet">Your installer will add your project here once it's booked.</EmptyState>
      ) : (
        projects.map((p) => (
          <article key={p.id} className="flex flex-col gap-3 rounded-2xl border border-line bg-card p-5">
            <div className="flex flex-wrap items-center gap-2">
              <h2 className="text-lg font-semibold">
                <Link href={`/projects/${p.id}`} className="hover:underline">
                  {p.title}
                </Link>
              </h2>
              <StageBadge stage={p.stage} />
            </div>
            <ProgressTrack stage={p.stage} />
          </article>
        ))
      )}
    </div>
  );
}
