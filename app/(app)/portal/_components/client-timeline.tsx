import { format } from "date-fns";
import { STAGE_LABELS, STAGES } from "@/lib/stages/stages";
import { StageBadge } from "@/components/ui/stage-badge";
import type { TimelineEntry } from "@/lib/portal/timeline";

/** The client's timeline: stage changes, finished checklists, photos and shared notes, newest first. */
export function ClientTimeline({ entries }: { entries: TimelineEntry[] }) {
  if (!entries.length) return <p className="text-sm text-muted">Nothing has happened yet; progress shows here as the work goes on.</p>;
  return (
    <ol className="flex flex-col gap-2" data-testid="client-timeline">
      {entries.map((e) => (
        <li key={`${e.kind}-${e.id}`} className="rounded-lg border border-line bg-card px-3 py-2 text-sm">
          <div className="flex flex-wrap items-center gap-2">
            <Entry entry={e} />
            <time className="ml-auto text-xs text-muted" dateTime={e.at.toISOString()}>
              {format(e.at, "d MMM yyyy")}
            </time>
          </div>
          {e.kind === "note" && <p className="mt-1 whitespace-pre-wrap">{e.body}</p>}
          {e.kind === "stage" && e.override && <p className="mt-1 text-ink/80">The project lead passed this step's check by decision{e.reason ? `: ${e.reason}` : "."}</p>}
          {e.kind === "stage" && !e.override && e.reason && e.fromStage && <p className="mt-1 text-ink/80">Reason: {e.reason}</p>}
        </li>
      ))}
    </ol>
  );
}

function Entry({ entry: e }: { entry: TimelineEntry }) {
  switch (e.kind) {
    case "stage":
      if (!e.fromStage) return <span className="font-medium">{`Project started in ${STAGE_LABELS[e.toStage]}`}</span>;
      if (e.fromStage === e.toStage) return <span className="font-medium">The cycle started again</span>;
      return (
        <>
          <span className="font-medium">{STAGES.indexOf(e.toStage) < STAGES.indexOf(e.fromStage) ? "Moved back to" : "Moved on to"}</span>
          <StageBadge stage={e.toStage} />
        </>
      );
    case "checklist":
      return <span className="font-medium">{`${STAGE_LABELS[e.stage]} checklist completed`}</span>;
    case "photo":
      return <span className="font-medium">{e.caption ? `New photo: ${e.caption}` : "New photo"}</span>;
    case "note":
      return <span className="font-medium">{`Note from ${e.byName}`}</span>;
  }
}
