"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import type { KitView } from "@/db/queries/test-kits";
import { ANALYTES, ANALYTE_NAMES, NEUTRAL_KIT_STEPS, basisUnit } from "@/lib/cycling/test-kits";
import { sendJson } from "@/lib/http/send-json";
import { Field } from "@/components/ui/field";
import { buttonStyles, inputStyles } from "@/components/ui/button-styles";
import { SubmitRow, type FormStatus } from "@/components/ui/submit-row";
import type { TestKitInput } from "@/app/api/settings/test-kits/test-kit.schema";

const steps = (s: readonly number[]) => s.join(", ");

/**
 * The kits the company uses: a name of its own, what the kit tests, how it prints its result, and the
 * steps offered as quick picks when a reading is logged. Each project chooses its kits on its water page.
 */
export function TestKitsPanel({ kits }: { kits: KitView[] }) {
  const router = useRouter();
  const [status, setStatus] = useState<FormStatus>(null);
  const [retiring, setRetiring] = useState<string | null>(null);
  const { register, handleSubmit, formState, setError, getValues, reset, watch } = useForm<TestKitInput>({
    defaultValues: { name: "", analyte: "ammonia", basis: "compound", steps: "" },
  });
  const analyte = watch("analyte") as keyof typeof NEUTRAL_KIT_STEPS;
  const onSubmit = handleSubmit(async () => {
    setStatus(null);
    const result = await sendJson<{ kit: KitView }>("/api/settings/test-kits", "POST", getValues());
    if (!result.ok) {
      for (const [field, message] of Object.entries(result.fields ?? {})) setError(field as keyof TestKitInput, { message });
      setStatus({ ok: false, text: result.error });
      return;
    }
    setStatus({ ok: true, text: `${result.data.kit.name} added. Choose it on a project's water page.` });
    reset({ name: "", analyte: getValues("analyte"), basis: "compound", steps: "" });
    router.refresh();
  });
  async function retire(kit: KitView) {
    setRetiring(kit.id);
    const result = await sendJson(`/api/settings/test-kits/${kit.id}/retire`, "POST");
    setRetiring(null);
    setStatus(result.ok ? { ok: true, text: `${kit.name} retired; projects that used it are offered the neutral steps.` } : { ok: false, text: result.error });
    router.refresh();
  }
  const e = formState.errors;
  const inUse = kits.filter((k) => !k.retired);
  return (
    <section aria-labelledby="kits-heading" className="flex flex-col gap-4 rounded-2xl border border-line bg-card p-5" data-testid="test-kits">
      <div>
        <h2 id="kits-heading" className="text-lg font-semibold">
          Test kits
        </h2>
        <p className="text-sm text-muted">
          The kits your team reads water with. Their steps become the quick picks beside each reading. Until a project chooses one of yours, it is offered
          Tankwright&apos;s neutral steps: {ANALYTES.map((a) => `${ANALYTE_NAMES[a].toLowerCase()} ${steps(NEUTRAL_KIT_STEPS[a])}`).join("; ")} (mg/L).
        </p>
      </div>
      {inUse.length > 0 ? (
        <ul className="flex flex-col divide-y divide-line">
          {inUse.map((k) => (
            <li key={k.id} className="flex flex-wrap items-center gap-x-3 gap-y-1 py-2 text-sm">
              <span className="font-semibold">{k.name}</span>
              <span className="text-muted">
                {ANALYTE_NAMES[k.analyte]}, {basisUnit(k.analyte, k.basis)}
              </span>
              <span className="num text-ink">{steps(k.steps)}</span>
              <button type="button" className={`${buttonStyles.quiet} ml-auto`} disabled={retiring === k.id} onClick={() => retire(k)}>
                Retire<span className="sr-only"> {k.name}</span>
              </button>
            </li>
          ))}
        </ul>
      ) : (
        <p className="text-sm text-muted">No kits described yet.</p>
      )}
      <form onSubmit={onSubmit} noValidate className="flex flex-col gap-3 border-t border-line pt-4" aria-label="Add a test kit">
        <div className="grid gap-3 sm:grid-cols-2">
          <Field id="kit-name" label="Kit name" error={e.name?.message} hint="Your own name for it, as the team knows it.">
            <input id="kit-name" className={inputStyles} aria-invalid={!!e.name} {...register("name")} />
          </Field>
          <Field id="kit-analyte" label="Tests for">
            <select id="kit-analyte" className={inputStyles} {...register("analyte")}>
              {ANALYTES.map((a) => (
                <option key={a} value={a}>
                  {ANALYTE_NAMES[a]}
                </option>
              ))}
            </select>
          </Field>
          <Field id="kit-basis" label="Result printed as" hint="Readings are saved as the compound; a kit printed as N is converted.">
            <select id="kit-basis" className={inputStyles} {...register("basis")}>
              <option value="compound">{basisUnit(analyte, "compound")}</option>
              <option value="nitrogen">{basisUnit(analyte, "nitrogen")}</option>
            </select>
          </Field>
          <Field id="kit-steps" label="Steps" error={e.steps?.message} hint="From 0 up, separated by commas, in the kit's own unit.">
            <input id="kit-steps" inputMode="decimal" className={`${inputStyles} num`} placeholder={steps(NEUTRAL_KIT_STEPS[analyte] ?? [])} aria-invalid={!!e.steps} {...register("steps")} />
          </Field>
        </div>
        <SubmitRow busy={formState.isSubmitting} label="Add kit" busyLabel="Adding…" status={status} />
      </form>
    </section>
  );
}
