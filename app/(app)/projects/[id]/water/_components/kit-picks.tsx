"use client";
import { basisUnit, toStoredMgL, type TestKit } from "@/lib/cycling/test-kits";

/**
 * The project's kit steps as quick picks beside a typed field. A kit printed "as N" is converted to
 * the stored basis when picked. "Below detection" is stored as 0; any typed value is still accepted.
 */
export function KitPicks({ label, kit, current, onPick }: { label: string; kit: TestKit; current: unknown; onPick: (value: string) => void }) {
  const now = current === "" || current == null ? null : Number(String(current).replace(",", "."));
  const unit = basisUnit(kit.analyte, kit.basis);
  return (
    <div role="group" aria-label={`${label} steps of ${kit.name}`} className="flex flex-col gap-1">
      <div className="flex flex-wrap gap-1">
        {kit.steps.map((step) => {
          const stored = toStoredMgL(step, kit.analyte, kit.basis);
          return (
            <button
              key={step}
              type="button"
              aria-pressed={now === stored}
              aria-label={step === 0 ? `${label} below detection (0 mg/L)` : `${label} ${step} ${unit}`}
              onClick={() => onPick(String(stored))}
              className={`rounded-md border px-2 py-0.5 text-xs num ${now === stored ? "border-accent bg-accent-soft text-accent-strong" : "border-line bg-paper text-ink hover:border-accent"}`}
            >
              {step === 0 ? "Below detection" : step}
            </button>
          );
        })}
      </div>
      <p className="text-xs text-muted">
        {kit.name}, {unit}
        {kit.basis === "nitrogen" ? "; a pick is converted and saved as the compound" : ""}
      </p>
    </div>
  );
}
