import { format } from "date-fns";

/** The latest water test and, during cycling, where the cycle stands, in plain words. */
export function WaterWords({ water, stage }: { water: { latest: { takenAt: Date; words: string } | null; summary: string | null }; stage: string }) {
  if (!water.summary && !water.latest) return null;
  return (
    <div className="flex flex-col gap-1 rounded-lg bg-stage-cycling-soft/60 px-3 py-2 text-sm" data-testid="water-words">
      {water.summary && <p className="font-medium">{water.summary}</p>}
      {water.latest && (
        <p className="text-muted">
          Latest test, {format(water.latest.takenAt, "d MMM, HH:mm")}: {water.latest.words}.
        </p>
      )}
      {stage === "cycling" && <p className="text-xs text-muted">No fish go in until the tests show the cycle is complete.</p>}
    </div>
  );
}
