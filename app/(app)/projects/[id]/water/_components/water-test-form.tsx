"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { useForm, type Resolver } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { format } from "date-fns";
import { correctWaterTestSchema, waterTestSchema, type WaterTestInput, type WaterTestValues } from "@/app/api/projects/[id]/water-tests/water-test.schema";
import type { Analyte } from "@/lib/cycling/readings";
import { NEUTRAL_TEST_KITS, type TestKit } from "@/lib/cycling/test-kits";
import { celsiusToFahrenheit } from "@/lib/tank/units";
import { sendJson } from "@/lib/http/send-json";
import { Field } from "@/components/ui/field";
import { buttonStyles, inputStyles } from "@/components/ui/button-styles";
import { KitPicks } from "./kit-picks";
import type { ReadingView } from "./views";
import { SubmitRow } from "@/components/ui/submit-row";

type FormInput = WaterTestInput & { reason?: string };
const localNow = () => format(new Date(), "yyyy-MM-dd'T'HH:mm");
const text = (v: number | null | undefined) => (v == null ? "" : String(Number(v.toFixed(3))));

const ANALYTES = [
  { name: "ammoniaMgL", analyte: "ammonia", label: "Ammonia", hint: undefined },
  { name: "nitriteMgL", analyte: "nitrite", label: "Nitrite", hint: undefined },
  { name: "nitrateMgL", analyte: "nitrate", label: "Nitrate", hint: undefined },
] as const;

/**
 * Logs a water test, or (for the lead) corrects one: the correction is saved as a new reading and
 * the old one is voided with the reason. Temperature is typed in the person's own unit.
 */
export function WaterTestForm({
  projectId,
  unitSystem,
  correcting,
  onDone,
  kits = NEUTRAL_TEST_KITS,
}: {
  projectId: string;
  unitSystem: "metric" | "imperial";
  correcting?: ReadingView;
  onDone?: () => void;
  /** The kit each analyte is read with on this project; its steps are the quick picks. */
  kits?: Readonly<Record<Analyte, TestKit>>;
}) {
  const router = useRouter();
  const unit = unitSystem === "imperial" ? "F" : "C";
  const [status, setStatus] = useState<{ ok: boolean; text: string } | null>(null);
  const prefill = (r?: ReadingView): FormInput => ({
    takenAt: r ? format(new Date(r.takenAt), "yyyy-MM-dd'T'HH:mm") : localNow(),
    ammoniaMgL: text(r?.ammoniaMgL),
    nitriteMgL: text(r?.nitriteMgL),
    nitrateMgL: text(r?.nitrateMgL),
    pH: text(r?.pH),
    temperature: r?.tempC == null ? "" : text(unit === "F" ? celsiusToFahrenheit(r.tempC) : r.tempC),
    temperatureUnit: unit,
    khDkh: text(r?.khDkh),
    salinityPpt: text((r as { salinityPpt?: number | null } | undefined)?.salinityPpt),
    notes: r?.notes ?? "",
    ...(r ? { reason: "" } : {}),
  });
  const schema = correcting ? correctWaterTestSchema : waterTestSchema;
  const { register, handleSubmit, formState, reset, setError, setValue, watch } = useForm<FormInput, unknown, WaterTestValues & { reason?: string }>({
    // One form for both: the correction schema only adds the reason.
    resolver: zodResolver(schema as typeof correctWaterTestSchema) as unknown as Resolver<FormInput, unknown, WaterTestValues & { reason?: string }>,
    defaultValues: prefill(correcting),
  });
  const idp = correcting ? `fix-${correcting.id}` : "wt";

  const onSubmit = handleSubmit(async (values) => {
    setStatus(null);
    const url = correcting ? `/api/projects/${projectId}/water-tests/${correcting.id}/correct` : `/api/projects/${projectId}/water-tests`;
    const result = await sendJson<{ cycleReadyNotified?: boolean }>(url, "POST", values);
    if (!result.ok) {
      for (const [field, message] of Object.entries(result.fields ?? {})) setError(field as keyof FormInput, { message });
      setStatus({ ok: false, text: result.error });
      return;
    }
    reset(prefill());
    setStatus({
      ok: true,
      text: result.data.cycleReadyNotified
        ? "Saved. This test opened the cycle gate: the lead and the client have been e-mailed."
        : correcting ? "Correction saved; the old reading is kept, voided." : "Saved.",
    });
    router.refresh();
    onDone?.();
  });

  const e = formState.errors;
  const err = (name: keyof FormInput) => e[name]?.message as string | undefined;
  return (
    <form
      onSubmit={onSubmit}
      noValidate
      aria-label={correcting ? "Correct a water test" : "Log a water test"}
      className={correcting ? "grid gap-3 sm:grid-cols-3" : "grid gap-3 rounded-2xl border border-line bg-card p-5 sm:grid-cols-3"}
    >
      {!correcting && <h2 className="text-lg font-semibold sm:col-span-3">Log a water test</h2>}
      <Field id={`${idp}-taken`} label="Taken at" error={err("takenAt")}>
        <input id={`${idp}-taken`} type="datetime-local" className={inputStyles} aria-invalid={!!e.takenAt} {...register("takenAt")} />
      </Field>
      {ANALYTES.map((a) => (
        <Field key={a.name} id={`${idp}-${a.name}`} label={`${a.label} (mg/L)`} error={err(a.name)} hint={a.hint}>
          <input id={`${idp}-${a.name}`} inputMode="decimal" className={`${inputStyles} num`} aria-invalid={!!e[a.name]} {...register(a.name)} />
          <KitPicks label={a.label} kit={kits[a.analyte]} current={watch(a.name)} onPick={(v) => setValue(a.name, v, { shouldDirty: true })} />
        </Field>
      ))}
      <Field id={`${idp}-ph`} label="pH" error={err("pH")}>
        <input id={`${idp}-ph`} inputMode="decimal" className={`${inputStyles} num`} aria-invalid={!!e.pH} {...register("pH")} />
      </Field>
      <Field id={`${idp}-temp`} label={`Temperature (°${unit})`} error={err("temperature")}>
        <input id={`${idp}-temp`} inputMode="decimal" className={`${inputStyles} num`} aria-invalid={!!e.temperature} {...register("temperature")} />
      </Field>
      <Field id={`${idp}-kh`} label="Carbonate hardness, KH (dKH, optional)" error={err("khDkh")}>
        <input id={`${idp}-kh`} inputMode="decimal" className={`${inputStyles} num`} aria-invalid={!!e.khDkh} {...register("khDkh")} />
      </Field>
      <Field id={`${idp}-sal`} label="Salinity, salt water only (ppt, optional)" error={err("salinityPpt")}>
        <input id={`${idp}-sal`} inputMode="decimal" className={`${inputStyles} num`} aria-invalid={!!e.salinityPpt} {...register("salinityPpt")} />
      </Field>
      <div className="sm:col-span-3">
        <Field id={`${idp}-notes`} label="Notes (optional)" error={err("notes")}>
          <input id={`${idp}-notes`} className={inputStyles} {...register("notes")} />
        </Field>
      </div>
      {correcting && (
        <div className="sm:col-span-3">
          <Field id={`${idp}-reason`} label="Why the old reading was wrong" error={err("reason")}>
            <input id={`${idp}-reason`} className={inputStyles} aria-invalid={!!e.reason} {...register("reason")} />
          </Field>
        </div>
      )}
      <SubmitRow
        busy={formState.isSubmitting}
        label={correcting ? "Save correction" : "Save water test"}
        busyLabel="Saving…"
        status={status}
        className="sm:col-span-3"
      >
        {onDone && (
          <button type="button" className={buttonStyles.secondary} onClick={onDone}>
            Cancel
          </button>
        )}
      </SubmitRow>
    </form>
  );
}
