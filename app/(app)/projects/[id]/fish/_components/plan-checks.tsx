import { Caution } from "@/components/ui/caution";
import { RULE_OF_THUMB_CAUTION, type StockingWarning } from "@/lib/stocking/checks";
import type { BioloadEstimate } from "@/lib/stocking/bioload";

/** The checks beside the plan: each finding in words, the bioload estimate with its rule, and the caution. */
export function PlanChecks({ warnings, bioload, hasDesign }: { warnings: StockingWarning[]; bioload: BioloadEstimate | null; hasDesign: boolean }) {
  return (
    <section aria-labelledby="checks-heading" className="flex flex-col gap-3 rounded-2xl border border-line bg-card p-5">
      <h2 id="checks-heading" className="text-lg font-semibold">
        Checks on the plan
      </h2>
      <Caution title="Rules of thumb">{RULE_OF_THUMB_CAUTION}</Caution>
      {!hasDesign && <p className="text-sm text-muted">The tank design isn't complete, so water kind, length, temperature and volume checks are skipped.</p>}
      {warnings.length === 0 ? (
        <p className="text-sm text-ok" data-testid="plan-clear">
          ✓ No rule of thumb is broken by this plan.
        </p>
      ) : (
        <ul className="flex flex-col gap-1 text-sm" data-testid="plan-warnings">
          {warnings.map((w) => (
            <li key={w.key} className={w.severity === "warning" ? "text-danger" : "text-caution"}>
              {w.severity === "warning" ? "! " : "· "}
              {w.message}
            </li>
          ))}
        </ul>
      )}
      {bioload && (
        <div className="text-sm" data-testid="bioload">
          <p>
            Stocking estimate: <span className="num font-semibold">{Math.round(bioload.fishCm)} cm</span> of adult fish against an allowance of about{" "}
            <span className="num font-semibold">{Math.round(bioload.allowanceCm)} cm</span> ({Math.round(bioload.share * 100)}%).
          </p>
          <p className="text-xs text-muted">{bioload.rule} It leaves out body bulk, filtration and feeding; treat it as a first look, not a limit.</p>
        </div>
      )}
    </section>
  );
}
