import { format } from "date-fns";
import { EVENT_LABELS } from "@/lib/stocking/census";
import { EmptyState } from "@/components/ui/empty-state";
import { GrowthChartLazy } from "./growth-chart-lazy";
import type { LivestockProps } from "./livestock-views";

const day = (iso: string) => format(new Date(iso), "d MMM yyyy");

function eventLine(e: LivestockProps["history"][number]): string {
  const n = e.count != null ? `${e.count} ` : "";
  switch (e.kind) {
    case "added":
      return `${n}added to the display`;
    case "lost":
      return `${n}lost${e.place === "holding" ? " in holding" : ""}${e.cause ? `: ${e.cause}` : ""}`;
    case "to_holding":
      return `${n}moved to ${e.holdingTankName ?? "a holding tank"}`;
    case "from_holding":
      return `${n}back from ${e.holdingTankName ?? "holding"} into the display`;
    case "rehomed":
      return `${n}rehomed${e.place === "holding" ? " from holding" : ""}`;
    case "measured":
      return `measured at ${e.lengthMm != null ? (e.lengthMm / 10).toFixed(1) : "?"} cm`;
    case "behaviour":
      return "behaviour";
  }
}

/** The census of the tank, a growth chart for each measured group, and the history, newest first. */
export function LivestockRecord({ record }: { record: LivestockProps }) {
  if (!record.groups.length) {
    return <EmptyState title="No fish in this tank yet.">Fish appear here when a batch of the plan leaves quarantine and goes into the display.</EmptyState>;
  }
  const name = new Map(record.groups.map((g) => [g.id, g.commonName]));
  const total = record.groups.reduce((n, g) => n + g.census.display, 0);
  return (
    <div className="flex flex-col gap-4">
      <table className="w-full text-sm" data-testid="census">
        <caption className="text-left font-semibold">Census: {total} fish in the display</caption>
        <thead className="text-left text-muted">
          <tr>
            <th className="py-1">Group</th>
            <th className="py-1">In the display</th>
            <th className="py-1">In holding</th>
            <th className="py-1">Source</th>
            <th className="py-1">Added</th>
          </tr>
        </thead>
        <tbody>
          {record.groups.map((g) => (
            <tr key={g.id} className="border-t border-line" data-testid={`census-${g.commonName}`}>
              <td className="py-1">
                {g.commonName} <i className="text-muted">{g.scientificName}</i>
              </td>
              <td className="num py-1" data-testid="in-display">{g.census.display}</td>
              <td className="num py-1" data-testid="in-holding">{g.census.holding}</td>
              <td className="py-1">{g.source}</td>
              <td className="py-1">{day(g.addedAt)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {record.groups
        .filter((g) => g.growth.length > 0)
        .map((g) => (
          <div key={g.id}>
            <h3 className="text-sm font-semibold">Growth: {g.commonName}</h3>
            <GrowthChartLazy name={g.commonName} points={g.growth} />
          </div>
        ))}
      <div>
        <h3 className="text-sm font-semibold">History</h3>
        <ol className="flex flex-col gap-1 text-sm" data-testid="livestock-history">
          {record.history.map((e) => (
            <li key={e.id}>
              <span className="text-muted">{day(e.at)} · </span>
              <span className="font-medium">{EVENT_LABELS[e.kind]}</span> · {name.get(e.groupId)}: {eventLine(e)}
              {e.note && <span className="text-muted"> — {e.note}</span>}
              <span className="text-muted"> ({e.byName})</span>
            </li>
          ))}
        </ol>
      </div>
    </div>
  );
}
