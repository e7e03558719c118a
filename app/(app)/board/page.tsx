import type { Metadata } from "next";
import Link from "next/link";
import { requirePageUser } from "@/server/session";
import { listVisibleProjects } from "@/db/queries/project-list";
import { STAGES, STAGE_LABELS } from "@/lib/stages/stages";
import { EmptyState } from "@/components/ui/empty-state";

export const metadata: Metadata = { title: "Board" };

export default async function BoardPage() {
  const user = await requirePageUser("lead", "crew");
  const projects = await listVisibleProjects(user);
  return (
    <div className="flex flex-col gap-4">
      <h1 className="text-2xl font-bold tracking-tight">Install board</h1>
      {projects.length === 0 ? (
        <EmptyState title="No installs yet">{user.role === "crew" ? "Projects you're assigned to will show here." : "Create a project to start."}</EmptyState>
      ) : (
        <div className="grid gap-3 md:grid-cols-4 xl:grid-cols-7">
          {STAGES.map((stage) => (
            <section key={stage} aria-label={STAGE_LABELS[stage]}>
              <h2 className="mb-2 text-sm font-semibold">{STAGE_LABELS[stage]}</h2>
              <ul className="flex flex-col gap-2">
                {projects
                  .filter((p) => p.stage === stage)
                  .map((p) => (
                    <li key={p.id} className="rounded-lg border border-line bg-card p-2 text-sm">
                      <Link href={`/projects/${p.id}`} className="font-semibold hover:underline">
                        {p.title}
                      </Link>
                      <p className="text-xs text-muted">{p.clientName} · {p.siteTown}</p>
                    </li>
                  ))}
              </ul>
            </section>
          ))}
        </div>
      )}
    </div>
  );
}
