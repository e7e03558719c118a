"use client";
import { useId, useState } from "react";
import { useForm } from "react-hook-form";
import { sendJson } from "@/lib/http/send-json";
import type { Stage } from "@/lib/stages/stages";
import { Field } from "@/components/ui/field";
import { buttonStyles, inputStyles } from "@/components/ui/button-styles";
import { newChecklistItemSchema, type NewChecklistItem } from "@/app/api/checklist-items/checklist-item.schema";
import type { TemplateItem } from "./template-types";

type FormValues = { label: string; hint: string; needsPhoto: boolean; measured: boolean; unit: string; min: string; max: string };

/** Adds an item to the end of a stage's list; a measured item takes its unit and allowed range. */
export function NewItemForm({ stage, onAdded }: { stage: Stage; onAdded: (i: TemplateItem) => void }) {
  const id = useId();
  const [open, setOpen] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const { register, handleSubmit, watch, reset, formState } = useForm<FormValues>({ defaultValues: { label: "", hint: "", needsPhoto: false, measured: false, unit: "", min: "", max: "" } });
  const [fieldErrors, setFieldErrors] = useState<Record<string, string>>({});
  const measured = watch("measured");

  const submit = handleSubmit(async (v) => {
    const body: NewChecklistItem = {
      stage,
      label: v.label,
      hint: v.hint || null,
      needsPhoto: v.needsPhoto,
      measure: v.measured ? { unit: v.unit, min: v.min === "" ? Number.NaN : Number(v.min), max: v.max === "" ? Number.NaN : Number(v.max) } : null,
    };
    // The same schema the server parses with, so a mistake shows before anything is sent.
    const parsed = newChecklistItemSchema.safeParse(body);
    if (!parsed.success) {
      const f: Record<string, string> = {};
      for (const i of parsed.error.issues) f[i.path.join(".")] ??= i.message;
      setFieldErrors(f);
      return;
    }
    setFieldErrors({});
    const res = await sendJson<{ item: TemplateItem }>("/api/checklist-items", "POST", parsed.data);
    if (!res.ok) {
      setFieldErrors(res.fields ?? {});
      setError(res.error);
      return;
    }
    setError(null);
    onAdded(res.data.item);
    reset();
    setOpen(false);
  });

  if (!open)
    return (
      <button type="button" className={`${buttonStyles.quiet} min-h-11 w-fit`} onClick={() => setOpen(true)}>
        + Add an item
      </button>
    );
  const fe = fieldErrors;
  return (
    <form onSubmit={submit} noValidate className="grid gap-2 rounded-lg border border-dashed border-line p-3 sm:grid-cols-3" aria-label="Add a checklist item">
      <div className="sm:col-span-3">
        <Field id={`${id}-label`} label="What to check" error={fe.label}>
          <input id={`${id}-label`} className={inputStyles} aria-invalid={!!fe.label} {...register("label")} />
        </Field>
      </div>
      <div className="sm:col-span-3">
        <Field id={`${id}-hint`} label="Hint (optional)" error={fe.hint}>
          <input id={`${id}-hint`} className={inputStyles} {...register("hint")} />
        </Field>
      </div>
      <label className="flex min-h-11 items-center gap-2 text-sm">
        <input type="checkbox" className="h-5 w-5" {...register("needsPhoto")} /> Needs a photo
      </label>
      <label className="flex min-h-11 items-center gap-2 text-sm sm:col-span-2">
        <input type="checkbox" className="h-5 w-5" {...register("measured")} /> Needs a measured value
      </label>
      {measured && (
        <>
          <Field id={`${id}-unit`} label="Unit" error={fe["measure.unit"]}>
            <input id={`${id}-unit`} className={inputStyles} placeholder="mm per m" {...register("unit")} />
          </Field>
          <Field id={`${id}-min`} label="Lowest allowed" error={fe["measure.min"]}>
            <input id={`${id}-min`} inputMode="decimal" className={inputStyles} {...register("min")} />
          </Field>
          <Field id={`${id}-max`} label="Highest allowed" error={fe["measure.max"]}>
            <input id={`${id}-max`} inputMode="decimal" className={inputStyles} {...register("max")} />
          </Field>
        </>
      )}
      <div className="flex gap-2 sm:col-span-3">
        <button type="submit" className={`${buttonStyles.primary} min-h-11`} disabled={formState.isSubmitting}>
          Add item
        </button>
        <button type="button" className={`${buttonStyles.secondary} min-h-11`} onClick={() => setOpen(false)}>
          Cancel
        </button>
      </div>
      {error && (
        <p role="alert" className="text-sm text-danger sm:col-span-3">
          {error}
        </p>
      )}
    </form>
  );
}
