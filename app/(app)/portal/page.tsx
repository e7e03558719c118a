import type { Metadata } from "next";
import Link from "next/link";
import { requirePageUser } from "@/server/session";
import { getClientHome } from "@/db/queries/client-home";
import { ProgressTrack } from "@/components/ui/progress-track";
import { StageBadge } from "@/components/ui/stage-badge";
import { EmptyState } from "@/components/ui/empty-state";
import { STAGE_BLURBS } from "@/lib/stages/stages";
import { ProjectPeople } from "./_components/project-people";
import { PhotoStrip } from "./_components/photo-strip";
import { WaterWords } from "./_components/water-words";
import { ClientActions } from "./_components/client-actions";
import { NextStep } from "./_components/next-step";

export const metadata: Metadata = { title: "Your tanks" };
export const dynamic = "force-dynamic";

export default async function PortalPage() {
  const user = await requirePageUser("client");
  const home = await getClientHome(user);
  return (
    <div className="mx-auto flex max-w-3xl flex-col gap-4">
      <h1 className="text-2xl font-bold tracking-tight">Your aquarium projects</h1>
      {home.length === 0 ? (
        <EmptyState title="No projects yet">Your installer will add your project here once it's booked.</EmptyState>
      ) : (
        home.map(({ project: p, next, water, photos, people }) => (
          <article key={p.id} className="flex flex-col gap-4 rounded-2xl border border-line bg-card p-5" aria-labelledby={`project-${p.id}`}>
            <div className="flex flex-wrap items-center gap-2">
              <h2 id={`project-${p.id}`} className="text-lg font-semibold">
                <Link href={`/projects/${p.id}`} className="hover:underline">
                  {p.title}
                </Link>
              </h2>
              <StageBadge stage={p.stage} />
            </div>
            <ProgressTrack stage={p.stage} />
            <p className="text-sm text-muted">Now: {STAGE_BLURBS[p.stage]}</p>
            <NextStep next={next} />
            <WaterWords water={water} stage={p.stage} />
            <ClientActions projectId={p.id} stage={p.stage} />
            <section className="flex flex-col gap-2">
              <h3 className="text-sm font-semibold">Recent photos</h3>
              <PhotoStrip photos={photos} projectId={p.id} />
            </section>
            <section className="flex flex-col gap-2">
              <h3 className="text-sm font-semibold">Your project team</h3>
              <ProjectPeople lead={people.lead} crew={people.crew} />
            </section>
          </article>
        ))
      )}
    </div>
  );
}
