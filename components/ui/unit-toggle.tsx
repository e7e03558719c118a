"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { sendJson } from "@/lib/http/send-json";
import type { UnitSystem } from "@/lib/tank/units";

const OPTIONS: { value: UnitSystem; label: string; hint: string }[] = [
  { value: "metric", label: "mm · kg · L", hint: "Millimetres, kilograms, litres" },
  { value: "imperial", label: "in · lb · gal", hint: "Inches, pounds, US gallons" },
];

/** The signed-in person's units for reading and typing measurements; what is stored stays SI. */
export function UnitToggle({ value }: { value: UnitSystem }) {
  const router = useRouter();
  const [current, setCurrent] = useState(value);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function choose(next: UnitSystem) {
    if (next === current || busy) return;
    setBusy(true);
    setError(null);
    const res = await sendJson("/api/me/units", "PATCH", { unitSystem: next });
    setBusy(false);
    if (!res.ok) {
      setError(res.error);
      return;
    }
    setCurrent(next);
    router.refresh();
  }

  return (
    <div className="no-print flex items-center gap-2 text-sm">
      <span id="unit-toggle-label" className="text-muted">
        Units
      </span>
      <div role="radiogroup" aria-labelledby="unit-toggle-label" className="inline-flex rounded-lg border border-line bg-card p-0.5">
        {OPTIONS.map((o) => (
          <button
            key={o.value}
            type="button"
            role="radio"
            aria-checked={current === o.value}
            title={o.hint}
            disabled={busy}
            onClick={() => choose(o.value)}
            className={`rounded-md px-2.5 py-1 text-xs font-semibold ${current === o.value ? "bg-accent text-white" : "text-ink hover:bg-paper"}`}
          >
            {o.label}
          </button>
        ))}
      </div>
      {error && (
        <span role="alert" className="text-xs text-danger">
          {error}
        </span>
      )}
    </div>
  );
}
