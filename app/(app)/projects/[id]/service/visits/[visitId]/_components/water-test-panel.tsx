"use client";
import { useState } from "react";
import { sendJson } from "@/lib/http/send-json";
import { buttonStyles, inputStyles } from "@/components/ui/button-styles";

const FIELDS = [
  { key: "nitrateMgL", label: "Nitrate (mg/L)" },
  { key: "ammoniaMgL", label: "Ammonia (mg/L)" },
  { key: "nitriteMgL", label: "Nitrite (mg/L)" },
  { key: "pH", label: "pH" },
  { key: "temperature", label: "Temperature (°C)" },
  { key: "khDkh", label: "KH (dKH)" },
  { key: "salinityPpt", label: "Salinity, salt water (ppt)" },
] as const;

type Key = (typeof FIELDS)[number]["key"];

/** The visit's water test, saved to the project's water-test record with the same checks. */
export function WaterTestPanel({ base, initial }: { base: string; initial: Record<string, unknown> | null }) {
  const [values, setValues] = useState<Record<Key, string>>(() => {
    const v = (k: string) => (initial && initial[k] != null ? String(initial[k]) : "");
    return { nitrateMgL: v("nitrateMgL"), ammoniaMgL: v("ammoniaMgL"), nitriteMgL: v("nitriteMgL"), pH: v("pH"), temperature: v("tempC"), khDkh: v("khDkh"), salinityPpt: v("salinityPpt") };
  });
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [status, setStatus] = useState<string | null>(initial ? "Test saved." : null);

  async function save() {
    setErrors({});
    setStatus(null);
    const res = await sendJson(`${base}/water-test`, "POST", { takenAt: new Date().toISOString(), temperatureUnit: "C", ...values });
    if (!res.ok) {
      setErrors(res.fields ?? { form: res.error });
      if (!res.fields) setStatus(res.error);
      return;
    }
    setStatus("Test saved.");
  }

  return (
    <fieldset className="grid grid-cols-2 gap-3 rounded-2xl border border-line bg-card p-4">
      <legend className="px-1 text-sm font-semibold">Water test</legend>
      {FIELDS.map((f) => (
        <div key={f.key} className="flex flex-col gap-1">
          <label htmlFor={`wt-${f.key}`} className="text-xs font-medium">
            {f.label}
          </label>
          <input
            id={`wt-${f.key}`}
            inputMode="decimal"
            className={`${inputStyles} num`}
            aria-invalid={!!errors[f.key]}
            value={values[f.key]}
            onChange={(e) => setValues((v) => ({ ...v, [f.key]: e.target.value }))}
          />
          {errors[f.key] && <p className="text-xs font-medium text-danger">{errors[f.key]}</p>}
        </div>
      ))}
      <div className="col-span-2 flex items-center gap-3">
        <button type="button" className={buttonStyles.secondary} onClick={() => void save()}>
          Save the test
        </button>
        {status && (
          <p role="status" className="text-xs">
            {status}
          </p>
        )}
      </div>
    </fieldset>
  );
}
