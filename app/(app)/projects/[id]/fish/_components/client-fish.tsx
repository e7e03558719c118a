/* eslint-disable @next/next/no-img-element -- thumbnails come from our own attachment route, already sized */
import { format } from "date-fns";
import { groupSentence, growthWords } from "@/lib/stocking/client-words";
import { EmptyState } from "@/components/ui/empty-state";
import { FishProblemForm } from "./fish-problem-form";
import { GrowthChartLazy } from "./growth-chart-lazy";
import type { LivestockProps } from "./livestock-views";

/** The client's view of their fish: who lives in the tank, how they are growing, photos, and a way to tell us about a problem. */
export function ClientFish({ projectId, stage, record, photos }: { projectId: string; stage: string; record: LivestockProps; photos: { id: string; caption: string | null }[] }) {
  return (
    <div className="flex flex-col gap-6">
      <section aria-labelledby="your-fish" className="flex flex-col gap-3 rounded-2xl border border-line bg-card p-5">
        <h2 id="your-fish" className="text-lg font-semibold">
          Your fish
        </h2>
        {record.groups.length === 0 ? (
          <EmptyState title="No fish yet.">Fish go in a few at a time once the water is ready and each group has finished its quarantine with us.</EmptyState>
        ) : (
          <ul className="flex flex-col gap-3" data-testid="client-fish">
            {record.groups.map((g) => {
              const growth = growthWords(
                g.growth.map((p) => ({ lengthCm: p.lengthCm, when: format(new Date(p.t), "d MMM") })),
                g.adultLengthMm,
              );
              return (
                <li key={g.id} className="text-sm">
                  <p>{groupSentence(g)}</p>
                  <p className="text-muted">
                    Here since {format(new Date(g.addedAt), "d MMM yyyy")}. {growth}
                  </p>
                  {g.growth.length > 1 && <GrowthChartLazy name={g.commonName} points={g.growth} />}
                </li>
              );
            })}
          </ul>
        )}
        {photos.length > 0 && (
          <ul className="flex flex-wrap gap-2" aria-label="Photos of the tank">
            {photos.map((p) => (
              <li key={p.id}>
                <img src={`/api/attachments/${p.id}?variant=thumb`} alt={p.caption ?? "Photo of the tank"} width={96} height={96} loading="lazy" className="h-24 w-24 rounded-lg border border-line object-cover" />
              </li>
            ))}
          </ul>
        )}
      </section>
      <FishProblemForm projectId={projectId} stage={stage} />
    </div>
  );
}
