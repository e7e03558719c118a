import type { ReactNode } from "react";
import { format } from "date-fns";

type Visit = { id: string; kind: string; startsAt: Date; durationMinutes: number; notes: string | null };

/** Booked visits, soonest first; past ones are dimmed. `actions` adds the lead's controls under each. */
export function VisitList({ visits, now = new Date(), actions }: { visits: Visit[]; now?: Date; actions?: (v: Visit) => ReactNode }) {
  if (!visits.length) return <p className="text-sm text-muted">No visits booked yet.</p>;
  return (
    <ul className="flex flex-col gap-2" data-testid="visit-list">
      {visits.map((v) => {
        const past = v.startsAt.getTime() + v.durationMinutes * 60_000 < now.getTime();
        return (
          <li key={v.id} className={`rounded-lg border border-line bg-card px-3 py-2 text-sm ${past ? "opacity-60" : ""}`}>
            <p>
              <span className="font-medium capitalize">{v.kind}</span> ·{" "}
              <time dateTime={v.startsAt.toISOString()}>{format(v.startsAt, "EEEE d MMMM yyyy, HH:mm")}</time> · about{" "}
              {v.durationMinutes >= 120 ? `${Math.round(v.durationMinutes / 60)} hours` : `${v.durationMinutes} minutes`}
            </p>
            {v.notes && <p className="text-muted">{v.notes}</p>}
            {actions?.(v)}
          </li>
        );
      })}
    </ul>
  );
}
