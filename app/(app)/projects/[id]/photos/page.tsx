import type { Metadata } from "next";
import { format } from "date-fns";
import { requirePageUser } from "@/server/session";
import { projectSectionTitle, requirePageProject } from "@/server/page-project";
import { listProjectAttachments, listVoidedPhotos } from "@/db/queries/attachments";
import { PhotoActions } from "./_components/photo-actions";
import { STAGE_LABELS, STAGES } from "@/lib/stages/stages";
import { EmptyState } from "@/components/ui/empty-state";
import { GalleryUpload } from "./_components/gallery-upload";

export const generateMetadata = ({ params }: { params: Promise<{ id: string }> }): Promise<Metadata> => projectSectionTitle(params, "Photos");

/** The project's photos and documents by stage, for the lead, the assigned crew and the owning client. */
export default async function PhotosPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requirePageUser();
  const { project } = await requirePageProject(id, user, "view");
  const isStaff = user.role !== "client";
  const [files, voided] = await Promise.all([listProjectAttachments(project.id), isStaff ? listVoidedPhotos(project.id) : []]);
  const stages = STAGES.filter((s) => files.some((f) => f.stage === s));
  return (
    <div className="flex flex-col gap-6">
      <GalleryUpload projectId={project.id} currentStage={project.stage} isClient={user.role === "client"} />
      {!files.length && <EmptyState title="No photos yet">Photos taken on the install day and any you add here show up by stage.</EmptyState>}
      {stages.map((stage) => (
        <section key={stage} aria-labelledby={`photos-${stage}`} className="flex flex-col gap-3">
          <h2 id={`photos-${stage}`} className="text-lg font-semibold">
            {STAGE_LABELS[stage]}
          </h2>
          <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-4" data-testid={`gallery-${stage}`}>
            {files
              .filter((f) => f.stage === stage)
              .map((f) => (
                <li key={f.id} className="flex flex-col overflow-hidden rounded-xl border border-line bg-card">
                  <a href={`/api/attachments/${f.id}?variant=full`} target="_blank" rel="noreferrer" className="block aspect-[4/3] bg-paper" aria-label={`Open ${f.caption ?? f.fileName} full size`}>
                    {f.thumbKey ? (
                      // eslint-disable-next-line @next/next/no-img-element
                      <img src={`/api/attachments/${f.id}?variant=thumb`} alt={f.caption ?? f.fileName} loading="lazy" className="h-full w-full object-cover" />
                    ) : (
                      <span className="flex h-full items-center justify-center text-sm font-semibold text-muted">PDF · {f.fileName}</span>
                    )}
                  </a>
                  <div className="flex flex-col gap-0.5 p-2 text-xs">
                    {f.isProblem && <span className="w-fit rounded bg-danger-soft px-1.5 py-0.5 font-semibold text-danger">Problem reported</span>}
                    {f.caption && <span className="text-sm text-ink">{f.caption}</span>}
                    <span className="text-muted">
                      {f.uploadedByName} · <time dateTime={f.uploadedAt.toISOString()}>{format(f.uploadedAt, "d MMM yyyy, HH:mm")}</time>
                    </span>
                    {(user.role === "lead" || f.uploadedBy === user.id) && (
                      <PhotoActions projectId={project.id} photoId={f.id} caption={f.caption} canCaption canVoid={user.role === "lead"} />
                    )}
                  </div>
                </li>
              ))}
          </ul>
        </section>
      ))}
      {voided.length > 0 && (
        <section aria-labelledby="voided-photos" className="flex flex-col gap-2">
          <h2 id="voided-photos" className="text-sm font-semibold text-muted">
            Voided photos (the team only)
          </h2>
          <ul className="flex flex-col gap-1 text-sm text-muted" data-testid="voided-photos">
            {voided.map((v) => (
              <li key={v.id}>
                {v.caption ?? v.fileName}: voided by {v.byName}
                {v.voidedAt ? ` on ${format(v.voidedAt, "d MMM yyyy")}` : ""}: {v.voidReason}
              </li>
            ))}
          </ul>
        </section>
      )}
    </div>
  );
}
