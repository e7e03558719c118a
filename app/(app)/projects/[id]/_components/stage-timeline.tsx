import { format } from "date-fns";
import { STAGE_LABELS, STAGES, type Stage } from "@/lib/stages/stages";
import { StageBadge } from "@/components/ui/stage-badge";

export type TimelineEvent = {
  id: string;
  at: Date;
  fromStage: Stage | null;
  toStage: Stage;
  reason: string | null;
  override: boolean;
  gateReasons: string[] | null;
  cycleRestarted?: boolean;
  byName: string;
};

/** Every stage change: who, when, from, to, and why when a gate was passed or the card went back. */
export function StageTimeline({ events }: { events: TimelineEvent[] }) {
  if (!events.length) return <p className="text-sm text-muted">No stage changes yet.</p>;
  return (
    <ol className="flex flex-col gap-3" data-testid="stage-timeline">
      {[...events].reverse().map((e) => {
        const back = e.fromStage && STAGES.indexOf(e.toStage) < STAGES.indexOf(e.fromStage);
        return (
          <li key={e.id} className="rounded-lg border border-line bg-card px-3 py-2 text-sm">
            <div className="flex flex-wrap items-center gap-2">
              {e.cycleRestarted && e.fromStage === e.toStage ? (
                <span className="font-medium">Cycle restarted on purpose</span>
              ) : e.fromStage ? (
                <>
                  <StageBadge stage={e.fromStage} />
                  <span aria-hidden="true">→</span>
                  <StageBadge stage={e.toStage} />
                </>
              ) : (
                <span className="font-medium">Project created in {STAGE_LABELS[e.toStage]}</span>
              )}
              {e.override && <span className="rounded bg-caution-soft px-1.5 py-0.5 text-xs font-semibold text-caution">Gate passed by the lead</span>}
              {e.cycleRestarted && e.fromStage !== e.toStage && (
                <span className="rounded bg-caution-soft px-1.5 py-0.5 text-xs font-semibold text-caution">Cycle restarted</span>
              )}
              {back && <span className="rounded bg-paper px-1.5 py-0.5 text-xs font-semibold text-muted">Moved back</span>}
              <span className="ml-auto text-xs text-muted">
                {e.byName} · <time dateTime={e.at.toISOString()}>{format(e.at, "d MMM yyyy, HH:mm")}</time>
              </span>
            </div>
            {e.reason && e.fromStage && <p className="mt-1 text-ink/80">Reason: {e.reason}</p>}
            {e.override && e.gateReasons?.length ? <p className="mt-1 text-xs text-muted">The gate had said: {e.gateReasons.join(" ")}</p> : null}
          </li>
        );
      })}
    </ol>
  );
}
