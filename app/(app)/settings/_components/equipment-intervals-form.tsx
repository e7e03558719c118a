"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { sendJson } from "@/lib/http/send-json";
import { inputStyles } from "@/components/ui/button-styles";
import { SubmitRow, type FormStatus } from "@/components/ui/submit-row";
import { EQUIPMENT_KINDS } from "@/lib/service/equipment-kinds";

const id = (kind: string) => `interval-${kind.replaceAll(/\W+/g, "-")}`;

/**
 * Days between services for each kind of equipment. The defaults are common practice, not a
 * maker's instruction; empty means no routine service. A piece's own interval still wins.
 */
export function EquipmentIntervalsForm({ intervals, commonPractice }: { intervals: Record<string, number | null>; commonPractice: Record<string, number | null> }) {
  const router = useRouter();
  const [values, setValues] = useState<Record<string, string>>(() => Object.fromEntries(EQUIPMENT_KINDS.map((k) => [k, intervals[k] == null ? "" : String(intervals[k])])));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [status, setStatus] = useState<FormStatus>(null);
  const [busy, setBusy] = useState(false);
  const onSubmit = async (e: React.FormEvent) => {
    e.preventDefault();
    setBusy(true);
    const result = await sendJson("/api/settings/equipment-intervals", "PUT", values);
    setBusy(false);
    setErrors(result.ok ? {} : (result.fields ?? {}));
    setStatus(result.ok ? { ok: true, text: "Saved. Every piece without its own interval now follows these." } : { ok: false, text: result.error });
    if (result.ok) router.refresh();
  };
  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="intervals-heading" className="flex flex-col gap-4 rounded-2xl border border-line bg-card p-5">
      <div>
        <h2 id="intervals-heading" className="text-lg font-semibold">
          Equipment service intervals
        </h2>
        <p className="text-sm text-muted">
          Days between services for each kind of equipment, used when a piece has no interval of its own. The suggested values are common practice, not a maker&apos;s instruction: follow the
          manual where it says otherwise. Leave a kind empty for no routine service.
        </p>
      </div>
      <div className="grid gap-x-4 gap-y-2 sm:grid-cols-2">
        {EQUIPMENT_KINDS.map((kind) => (
          <div key={kind} className="flex flex-col gap-1">
            <label htmlFor={id(kind)} className="text-sm font-medium">
              {kind}
            </label>
            <input
              id={id(kind)}
              inputMode="numeric"
              className={`${inputStyles} num max-w-32`}
              value={values[kind]}
              aria-invalid={!!errors[kind]}
              aria-describedby={`${id(kind)}-hint`}
              onChange={(e) => setValues((v) => ({ ...v, [kind]: e.target.value }))}
            />
            <p id={`${id(kind)}-hint`} className={`text-xs ${errors[kind] ? "font-medium text-danger" : "text-muted"}`}>
              {errors[kind] ?? (commonPractice[kind] == null ? "Common practice: none" : `Common practice: ${commonPractice[kind]} days`)}
            </p>
          </div>
        ))}
      </div>
      <SubmitRow busy={busy} label="Save intervals" busyLabel="Saving…" status={status} />
    </form>
  );
}
