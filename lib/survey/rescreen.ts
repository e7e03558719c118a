import type { LoadCheckResults } from "./load-check";

type Verdicts = { glassOk: boolean; floor: string | null; needsEngineer: boolean };

function verdicts(r: Pick<LoadCheckResults, "glass" | "floor" | "needsEngineerReference">): Verdicts {
  return { glassOk: r.glass.ok, floor: r.floor?.verdict ?? null, needsEngineer: r.needsEngineerReference };
}

/**
 * Why an approval made under earlier rules no longer stands, comparing the verdicts it recorded
 * with the same inputs screened now; null when glass and floor verdicts are unchanged.
 */
export function rescreenVerdict(before: Pick<LoadCheckResults, "glass" | "floor" | "needsEngineerReference">, now: Pick<LoadCheckResults, "glass" | "floor" | "needsEngineerReference">): string | null {
  const a = verdicts(before);
  const b = verdicts(now);
  const changes: string[] = [];
  if (a.glassOk !== b.glassOk)
    changes.push(b.glassOk ? "the glass check now passes" : "the glass check now fails (walls are checked by how their top edge is held; open tops need more glass)");
  if (a.floor !== b.floor || a.needsEngineer !== b.needsEngineer)
    changes.push(
      b.needsEngineer && !a.needsEngineer
        ? "the floor screening now needs a structural engineer"
        : `the floor screening's verdict changed (${a.floor ?? "none"} → ${b.floor ?? "none"})`,
    );
  if (!changes.length) return null;
  return `The load check was approved under earlier screening rules, and ${changes.join(" and ")}; approve it again.`;
}
