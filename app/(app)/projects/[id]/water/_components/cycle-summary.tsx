import { format } from "date-fns";
import { PHASE_LABELS, type CycleEvaluation } from "@/lib/cycling/evaluate-cycle";
import { readingWarnings, stallWarning, type CycleWarning } from "@/lib/cycling/warnings";
import { describeCycleForClient } from "@/lib/cycling/summary";
import type { WaterTest } from "@/lib/cycling/readings";
import type { WaterTestRow } from "@/db/queries/water";
import type { Stage } from "@/lib/stages/stages";
import { Caution } from "@/components/ui/caution";

/** The gate's verdict in plain words: phase, what is still missing, how long, and any warnings. */
export function CycleSummary({
  evaluation,
  readings,
  stage,
  notifiedAt,
  forClient,
  now,
}: {
  evaluation: CycleEvaluation;
  readings: WaterTestRow[];
  stage: Stage;
  notifiedAt: Date | null;
  forClient: boolean;
  now: Date;
}) {
  const tests: WaterTest[] = readings.map((r) => ({ ...r, voided: r.voided }));
  const fishPresent = stage === "first_stocking" || stage === "in_service";
  const latest = readings.find((r) => !r.voided);
  const warnings: CycleWarning[] = latest ? readingWarnings(latest, { fishPresent }) : [];
  const stall = stallWarning(tests, now, evaluation.rules.stallDays, evaluation.rules.stallChangeMgL);
  if (stall) warnings.push(stall);
  const { ready, phase, reasons, daysSinceStart } = evaluation;

  return (
    <section aria-labelledby="cycle-heading" data-testid="cycle-summary" className="flex flex-col gap-3 rounded-2xl border border-line bg-card p-5">
      <div className="flex flex-wrap items-center gap-3">
        <h2 id="cycle-heading" className="text-lg font-semibold">
          Cycle
        </h2>
        <span
          data-testid="cycle-phase"
          className={`rounded-full px-2.5 py-0.5 text-xs font-semibold ${ready ? "bg-ok-soft text-ok" : "bg-stage-cycling-soft text-stage-cycling-ink"}`}
        >
          {ready ? "✓ " : ""}
          {PHASE_LABELS[phase]}
        </span>
        {daysSinceStart !== null && (
          <span className="text-sm text-muted">
            Day <span className="num font-semibold text-ink">{daysSinceStart}</span> since the cycle began
          </span>
        )}
      </div>

      {forClient && <p className="text-sm">{describeCycleForClient(evaluation, tests)}</p>}

      {ready ? (
        <p className="text-sm font-medium text-ok" data-testid="gate-ready">
          Ready for fish: ammonia and nitrite have read zero on repeat tests under the company&apos;s rules.
          {notifiedAt && <span className="font-normal text-muted"> The lead and client were told on {format(notifiedAt, "d MMM yyyy, HH:mm")}.</span>}
        </p>
      ) : (
        <div className="text-sm" data-testid="gate-reasons">
          <p className="font-medium">Not ready for fish yet:</p>
          <ul className="ml-5 list-disc text-ink/80">
            {reasons.map((r) => (
              <li key={r}>{r}</li>
            ))}
          </ul>
        </div>
      )}

      {warnings.length > 0 && (
        <div className="flex flex-col gap-2" aria-label="Warnings">
          {warnings.map((w) => (
            <Caution key={w.code} tone={w.level === "danger" ? "danger" : "caution"}>
              {w.message}
            </Caution>
          ))}
        </div>
      )}
    </section>
  );
}
