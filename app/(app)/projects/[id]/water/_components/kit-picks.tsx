"use client";

/**
 * The kit's colour-card steps as quick picks beside a typed field. "Below detection" is stored as 0,
 * the same as the card's lowest colour; any typed value is still accepted.
 */
export function KitPicks({ label, steps, current, onPick }: { label: string; steps: readonly number[]; current: unknown; onPick: (value: string) => void }) {
  const now = current === "" || current == null ? null : Number(String(current).replace(",", "."));
  return (
    <div role="group" aria-label={`${label} kit steps`} className="flex flex-wrap gap-1">
      {steps.map((step) => (
        <button
          key={step}
          type="button"
          aria-pressed={now === step}
          aria-label={step === 0 ? `${label} below detection (0 mg/L)` : `${label} ${step} mg/L`}
          onClick={() => onPick(String(step))}
          className={`rounded-md border px-2 py-0.5 text-xs num ${now === step ? "border-accent bg-accent-soft text-accent-strong" : "border-line bg-paper text-ink hover:border-accent"}`}
        >
          {step === 0 ? "Below detection" : step}
        </button>
      ))}
    </div>
  );
}
