"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { format } from "date-fns";
import { doseSchema, type DoseInput, type DoseValues } from "@/app/api/projects/[id]/doses/dose.schema";
import { sendJson } from "@/lib/http/send-json";
import { Field } from "@/components/ui/field";
import { inputStyles } from "@/components/ui/button-styles";
import { DoseCalculator, type DoseSuggestion } from "./dose-calculator";
import { VoidButton } from "./void-button";
import { formatReading, type DoseView } from "./views";
import { SubmitRow } from "@/components/ui/submit-row";

const fresh = (): DoseInput => ({ dosedAt: format(new Date(), "yyyy-MM-dd'T'HH:mm"), targetMgL: "2", amountMl: "", sourcePercent: "", notes: "" });

/** Ammonia doses for a fishless cycle: the calculator, the log form, and the log. Staff only. */
export function DosePanel({ projectId, doses, designVolume, unitSystem, canVoid }: { projectId: string; doses: DoseView[]; designVolume: { netVolumeL: number; sumpVolumeL: number } | null; unitSystem: "metric" | "imperial"; canVoid: boolean }) {
  const router = useRouter();
  const [status, setStatus] = useState<{ ok: boolean; text: string } | null>(null);
  const { register, handleSubmit, formState, reset, setError, setValue } = useForm<DoseInput, unknown, DoseValues>({ resolver: zodResolver(doseSchema), defaultValues: fresh() });
  const use = (s: DoseSuggestion) => {
    setValue("targetMgL", String(s.targetMgL));
    setValue("amountMl", String(s.amountMl));
    setValue("sourcePercent", String(s.sourcePercent));
  };
  const onSubmit = handleSubmit(async (values) => {
    setStatus(null);
    const result = await sendJson(`/api/projects/${projectId}/doses`, "POST", values);
    if (!result.ok) {
      for (const [field, message] of Object.entries(result.fields ?? {})) setError(field as keyof DoseInput, { message });
      setStatus({ ok: false, text: result.error });
      return;
    }
    reset(fresh());
    setStatus({ ok: true, text: "Dose logged. Ammonia and nitrite must read zero within the rule's time after it." });
    router.refresh();
  });
  const e = formState.errors;
  return (
    <section aria-labelledby="doses-heading" className="flex flex-col gap-5 rounded-2xl border border-line bg-card p-5">
      <h2 id="doses-heading" className="text-lg font-semibold">
        Ammonia dosing (fishless cycle)
      </h2>
      <DoseCalculator designVolume={designVolume} unitSystem={unitSystem} onUse={use} />
      <form onSubmit={onSubmit} noValidate aria-label="Log an ammonia dose" className="grid gap-3 sm:grid-cols-4">
        <h3 className="font-semibold sm:col-span-4">Log a dose</h3>
        <Field id="dose-at" label="Dosed at" error={e.dosedAt?.message}>
          <input id="dose-at" type="datetime-local" className={inputStyles} aria-invalid={!!e.dosedAt} {...register("dosedAt")} />
        </Field>
        <Field id="dose-target" label="Target (mg/L)" error={e.targetMgL?.message}>
          <input id="dose-target" inputMode="decimal" className={`${inputStyles} num`} aria-invalid={!!e.targetMgL} {...register("targetMgL")} />
        </Field>
        <Field id="dose-amount" label="Amount (mL, optional)" error={e.amountMl?.message}>
          <input id="dose-amount" inputMode="decimal" className={`${inputStyles} num`} aria-invalid={!!e.amountMl} {...register("amountMl")} />
        </Field>
        <Field id="dose-strength" label="Strength (% NH3, optional)" error={e.sourcePercent?.message}>
          <input id="dose-strength" inputMode="decimal" className={`${inputStyles} num`} aria-invalid={!!e.sourcePercent} {...register("sourcePercent")} />
        </Field>
        <div className="sm:col-span-4">
          <Field id="dose-notes" label="Notes (optional)" error={e.notes?.message}>
            <input id="dose-notes" className={inputStyles} {...register("notes")} />
          </Field>
        </div>
        <SubmitRow busy={formState.isSubmitting} label="Log dose" busyLabel="Saving…" status={status} className="sm:col-span-4" />
      </form>
      {doses.length === 0 ? (
        <p className="text-sm text-muted">No doses logged yet.</p>
      ) : (
        <ul className="flex flex-col gap-2 text-sm" aria-label="Doses">
          {doses.map((d) => (
            <li key={d.id} className={`flex flex-wrap items-start gap-3 rounded-lg border border-line px-3 py-2 ${d.voided ? "text-muted" : ""}`}>
              <span className={d.voided ? "line-through" : ""}>
                <time dateTime={d.dosedAt}>{format(new Date(d.dosedAt), "d MMM yyyy, HH:mm")}</time> · to <span className="num">{formatReading(d.targetMgL)} mg/L</span>
                {d.amountMl != null && <span className="num"> · {formatReading(d.amountMl)} mL</span>}
                {d.sourcePercent != null && <span className="num"> of {formatReading(d.sourcePercent)} %</span>} · {d.byName}
                {d.notes && ` · ${d.notes}`}
              </span>
              {d.voided && <span className="text-xs">Voided: {d.voidReason}</span>}
              {canVoid && !d.voided && (
                <span className="ml-auto">
                  <VoidButton url={`/api/projects/${projectId}/doses/${d.id}/void`} what="dose" id={d.id} />
                </span>
              )}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
