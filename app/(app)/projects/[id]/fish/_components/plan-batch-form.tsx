"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { useFieldArray, useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { planBatchSchema, type PlanBatchInput, type PlanBatchValues } from "@/app/api/projects/[id]/stocking-plan/plan.schema";
import { sendJson } from "@/lib/http/send-json";
import { Field } from "@/components/ui/field";
import { buttonStyles, inputStyles } from "@/components/ui/button-styles";
import { SubmitRow, type FormStatus } from "@/components/ui/submit-row";

export type SpeciesOption = { id: string; label: string };

const blank = (): PlanBatchInput => ({ items: [{ speciesId: "", count: "" as unknown as number }], note: "" });

/** The lead's form for the next batch of the plan: species from the catalogue and how many of each. */
export function PlanBatchForm({ projectId, species, nextPosition }: { projectId: string; species: SpeciesOption[]; nextPosition: number }) {
  const router = useRouter();
  const [status, setStatus] = useState<FormStatus>(null);
  const { register, control, handleSubmit, formState, reset, setError } = useForm<PlanBatchInput, unknown, PlanBatchValues>({ resolver: zodResolver(planBatchSchema), defaultValues: blank() });
  const { fields, append, remove } = useFieldArray({ control, name: "items" });
  const onSubmit = handleSubmit(async (values) => {
    const result = await sendJson(`/api/projects/${projectId}/stocking-plan/batches`, "POST", values);
    if (!result.ok) {
      for (const [field, message] of Object.entries(result.fields ?? {})) setError(field as "items", { message });
      setStatus({ ok: false, text: result.error });
      return;
    }
    reset(blank());
    setStatus({ ok: true, text: `Batch ${nextPosition} added to the plan.` });
    router.refresh();
  });
  const e = formState.errors;
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Plan a batch" className="flex flex-col gap-3 rounded-2xl border border-line bg-card p-5">
      <h3 className="font-semibold">Plan batch {nextPosition}</h3>
      {fields.map((f, i) => (
        <div key={f.id} className="grid gap-2 sm:grid-cols-[1fr_8rem_auto]">
          <Field id={`item-${i}-species`} label={`Species ${i + 1}`} error={e.items?.[i]?.speciesId?.message}>
            <select id={`item-${i}-species`} className={inputStyles} aria-invalid={!!e.items?.[i]?.speciesId} {...register(`items.${i}.speciesId`)}>
              <option value="">Choose…</option>
              {species.map((s) => (
                <option key={s.id} value={s.id}>
                  {s.label}
                </option>
              ))}
            </select>
          </Field>
          <Field id={`item-${i}-count`} label={`How many (species ${i + 1})`} error={e.items?.[i]?.count?.message}>
            <input id={`item-${i}-count`} inputMode="numeric" className={`${inputStyles} num`} aria-invalid={!!e.items?.[i]?.count} {...register(`items.${i}.count`)} />
          </Field>
          {fields.length > 1 && (
            <button type="button" className={`${buttonStyles.quiet} self-end pb-2`} onClick={() => remove(i)}>
              Remove
            </button>
          )}
        </div>
      ))}
      {e.items?.message && <p className="text-xs font-medium text-danger">{e.items.message}</p>}
      <button type="button" className={`${buttonStyles.quiet} self-start`} onClick={() => append({ speciesId: "", count: "" as unknown as number })}>
        + Another species
      </button>
      <Field id="batch-note" label="Note (optional)" error={e.note?.message}>
        <input id="batch-note" className={inputStyles} {...register("note")} />
      </Field>
      <SubmitRow busy={formState.isSubmitting} label="Add batch to the plan" busyLabel="Saving…" status={status} />
    </form>
  );
}
