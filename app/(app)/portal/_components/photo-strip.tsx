/* eslint-disable @next/next/no-img-element -- thumbnails come from our own attachment route, already sized */
type Photo = { id: string; caption: string | null; fileName: string };

/** Recent photos as thumbnails; nothing is shown when there are none yet. */
export function PhotoStrip({ photos, projectId }: { photos: Photo[]; projectId: string }) {
  if (!photos.length) return <p className="text-sm text-muted">No photos yet. The crew adds them as the work goes on.</p>;
  return (
    <ul className="flex flex-wrap gap-2">
      {photos.map((p) => (
        <li key={p.id}>
          <a href={`/projects/${projectId}/photos`} className="block overflow-hidden rounded-lg border border-line bg-paper">
            <img src={`/api/attachments/${p.id}?variant=thumb`} alt={p.caption ?? p.fileName} width={96} height={96} loading="lazy" className="h-24 w-24 object-cover" />
          </a>
        </li>
      ))}
    </ul>
  );
}
