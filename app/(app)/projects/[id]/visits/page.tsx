import type { Metadata } from "next";
import { requirePageUser } from "@/server/session";
import { projectSectionTitle, requirePageProject } from "@/server/page-project";
import { listVisits } from "@/db/queries/visits";
import { buttonStyles } from "@/components/ui/button-styles";
import { VisitList } from "@/app/(app)/portal/_components/visit-list";
import { VisitForm } from "./_components/visit-form";
import { VisitActions } from "./_components/visit-actions";

export const generateMetadata = ({ params }: { params: Promise<{ id: string }> }): Promise<Metadata> => projectSectionTitle(params, "Visits");
export const dynamic = "force-dynamic";

export default async function VisitsPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requirePageUser("lead", "crew");
  const { project } = await requirePageProject(id, user);
  const visits = await listVisits(project.id);
  return (
    <section aria-labelledby="visits-heading" className="flex max-w-3xl flex-col gap-4">
      <div className="flex flex-wrap items-center gap-3">
        <h2 id="visits-heading" className="text-lg font-semibold">
          Visits
        </h2>
        <a href={`/api/projects/${project.id}/calendar.ics`} className={`${buttonStyles.secondary} ml-auto`} download>
          Add to calendar
        </a>
      </div>
      <VisitList
        visits={visits}
        actions={
          user.role === "lead"
            ? (v) => <VisitActions projectId={project.id} visit={{ id: v.id, kind: v.kind as never, startsAt: v.startsAt.toISOString(), durationMinutes: v.durationMinutes, notes: v.notes }} />
            : undefined
        }
      />
      {user.role === "lead" && <VisitForm projectId={project.id} />}
    </section>
  );
}
