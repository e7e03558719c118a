"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { cycleRulesSchema, type CycleRulesInput, type CycleRulesValues } from "@/app/api/settings/cycle-rules/cycle-rules.schema";
import type { CycleRules } from "@/lib/cycling/cycle-rules";
import { sendJson } from "@/lib/http/send-json";
import { Field } from "@/components/ui/field";
import { inputStyles } from "@/components/ui/button-styles";
import { SubmitRow } from "@/components/ui/submit-row";

type NumericRule = Exclude<keyof CycleRules, "requireNitrate">;

const NUMERIC: { key: NumericRule; label: string; unit: string; meaning: string }[] = [
  { key: "zeroReadingsNeeded", label: "Zero readings needed", unit: "readings", meaning: "How many tests in a row must show ammonia and nitrite both at zero, ending with the newest." },
  { key: "minHoursBetweenZeros", label: "Spacing between those zero readings", unit: "hours", meaning: "Zero readings closer together than this count as one, so a tank is seen to hold zero over time." },
  { key: "maxAgeHoursOfLatest", label: "Maximum age of the latest test", unit: "hours", meaning: "Past this, the gate asks for a fresh test before fish go in." },
  { key: "clearWithinHoursOfDose", label: "Time for a dose to clear", unit: "hours", meaning: "After the last logged ammonia dose, ammonia and nitrite must read zero within this time." },
  { key: "stallDays", label: "Days without change before a stall", unit: "days", meaning: "A cycle whose ammonia and nitrite haven't moved for this long is flagged as stalled." },
  { key: "stallChangeMgL", label: "Smallest change that counts as progress", unit: "mg/L", meaning: "Changes smaller than this don't count as the cycle moving (one kit step is usual)." },
];

const text = (v: unknown) => (v === undefined || v === null ? "" : String(v));

/** The lead's editor for the cycle gate's rules; an empty field uses the house default shown beside it. */
export function CycleRulesForm({ overrides, defaults }: { overrides: Partial<CycleRules>; defaults: CycleRules }) {
  const router = useRouter();
  const [status, setStatus] = useState<{ ok: boolean; text: string } | null>(null);
  const initial: CycleRulesInput = {
    ...Object.fromEntries(NUMERIC.map((r) => [r.key, text(overrides[r.key])])),
    requireNitrate: overrides.requireNitrate === undefined ? "" : String(overrides.requireNitrate),
  };
  const { register, handleSubmit, formState, setError } = useForm<CycleRulesInput, unknown, CycleRulesValues>({ resolver: zodResolver(cycleRulesSchema), defaultValues: initial });
  const onSubmit = handleSubmit(async (values) => {
    setStatus(null);
    const result = await sendJson<{ projectsNotified: number }>("/api/settings/cycle-rules", "PUT", values);
    if (!result.ok) {
      for (const [field, message] of Object.entries(result.fields ?? {})) setError(field as keyof CycleRulesInput, { message });
      setStatus({ ok: false, text: result.error });
      return;
    }
    const n = result.data.projectsNotified;
    setStatus({ ok: true, text: n ? `Saved. ${n} cycling project${n === 1 ? "" : "s"} now pass the gate; their leads and clients were e-mailed.` : "Saved." });
    router.refresh();
  });
  const e = formState.errors;
  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="cycle-rules-heading" className="flex flex-col gap-4 rounded-2xl border border-line bg-card p-5">
      <div>
        <h2 id="cycle-rules-heading" className="text-lg font-semibold">
          Cycle rules
        </h2>
        <p className="text-sm text-muted">
          When a tank counts as cycled and ready for fish. Leave a field empty to use the house default. The defaults are common practice for a fishless cycle.
        </p>
      </div>
      <div className="grid gap-4 sm:grid-cols-2">
        {NUMERIC.map((r) => (
          <Field key={r.key} id={`rule-${r.key}`} label={`${r.label} (${r.unit})`} error={e[r.key]?.message} hint={`${r.meaning} Default: ${defaults[r.key]} ${r.unit}.`}>
            <input id={`rule-${r.key}`} inputMode="decimal" placeholder={String(defaults[r.key])} className={`${inputStyles} num`} aria-invalid={!!e[r.key]} {...register(r.key)} />
          </Field>
        ))}
        <Field id="rule-requireNitrate" label="Require nitrate to have been seen" error={e.requireNitrate?.message} hint={`Nitrate above zero since the cycle began shows the bacteria did their work. Default: ${defaults.requireNitrate ? "yes" : "no"}.`}>
          <select id="rule-requireNitrate" className={inputStyles} {...register("requireNitrate")}>
            <option value="">Default ({defaults.requireNitrate ? "yes" : "no"})</option>
            <option value="true">Yes</option>
            <option value="false">No</option>
          </select>
        </Field>
      </div>
      <SubmitRow busy={formState.isSubmitting} label="Save cycle rules" busyLabel="Saving…" status={status} />
    </form>
  );
}
