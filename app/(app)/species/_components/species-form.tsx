"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { speciesSchema, type SpeciesInput, type SpeciesValues } from "@/app/api/species/species.schema";
import { DIETS, SWIM_LEVELS, TEMPERAMENTS, WATER_KINDS } from "@/lib/stocking/species";
import { sendJson } from "@/lib/http/send-json";
import { Field } from "@/components/ui/field";
import { buttonStyles, inputStyles } from "@/components/ui/button-styles";
import { SubmitRow, type FormStatus } from "@/components/ui/submit-row";

export type SpeciesFormRow = SpeciesValues & { id: string };

const str = (v: unknown) => (v === null || v === undefined ? "" : String(v));
const blank: Record<string, string> = { water: "fresh", temperament: "peaceful", level: "middle", diet: "omnivore", shoalMin: "1", source: "from memory", coralSafe: "", invertSafe: "" };

const NUMBERS: { key: keyof SpeciesInput; label: string }[] = [
  { key: "tempMinC", label: "Lowest °C" },
  { key: "tempMaxC", label: "Highest °C" },
  { key: "phMin", label: "Lowest pH" },
  { key: "phMax", label: "Highest pH" },
  { key: "adultLengthMm", label: "Adult length (mm)" },
  { key: "shoalMin", label: "Smallest group (1 if alone)" },
  { key: "minTankLengthMm", label: "Minimum tank length (mm, optional)" },
];

/** The lead's form for a catalogue entry; the same schema checks it on the server. */
export function SpeciesForm({ editing, onDone }: { editing: SpeciesFormRow | null; onDone: () => void }) {
  const router = useRouter();
  const [status, setStatus] = useState<FormStatus>(null);
  const initial = editing ? Object.fromEntries(Object.entries(editing).map(([k, v]) => [k, str(v)])) : blank;
  const { register, handleSubmit, formState, setError, reset } = useForm<SpeciesInput, unknown, SpeciesValues>({ resolver: zodResolver(speciesSchema), defaultValues: initial as unknown as SpeciesInput });
  const onSubmit = handleSubmit(async (values) => {
    const result = editing ? await sendJson(`/api/species/${editing.id}`, "PUT", values) : await sendJson("/api/species", "POST", values);
    if (!result.ok) {
      for (const [field, message] of Object.entries(result.fields ?? {})) setError(field as keyof SpeciesInput, { message });
      setStatus({ ok: false, text: result.error });
      return;
    }
    setStatus({ ok: true, text: editing ? "Saved." : "Added to the catalogue." });
    if (!editing) reset(blank as unknown as SpeciesInput);
    router.refresh();
    if (editing) onDone();
  });
  const e = formState.errors as Record<string, { message?: string } | undefined>;
  const select = (key: keyof SpeciesInput, label: string, options: readonly string[], empty?: string) => (
    <Field id={`sp-${key}`} label={label} error={e[key]?.message}>
      <select id={`sp-${key}`} className={inputStyles} {...register(key)}>
        {empty && <option value="">{empty}</option>}
        {options.map((o) => (
          <option key={o} value={o}>
            {o}
          </option>
        ))}
      </select>
    </Field>
  );
  return (
    <form onSubmit={onSubmit} noValidate aria-label={editing ? `Edit ${editing.commonName}` : "Add a species"} className="flex flex-col gap-3 rounded-2xl border border-line bg-card p-5">
      <h2 className="text-lg font-semibold">{editing ? `Edit ${editing.commonName}` : "Add a species"}</h2>
      <div className="grid gap-3 sm:grid-cols-3">
        <Field id="sp-commonName" label="Common name" error={e.commonName?.message}>
          <input id="sp-commonName" className={inputStyles} {...register("commonName")} />
        </Field>
        <Field id="sp-scientificName" label="Scientific name" error={e.scientificName?.message}>
          <input id="sp-scientificName" className={inputStyles} {...register("scientificName")} />
        </Field>
        {select("water", "Water", WATER_KINDS)}
        {NUMBERS.map((n) => (
          <Field key={n.key} id={`sp-${n.key}`} label={n.label} error={e[n.key]?.message}>
            <input id={`sp-${n.key}`} inputMode="decimal" className={`${inputStyles} num`} {...register(n.key)} />
          </Field>
        ))}
        {select("temperament", "Temperament", TEMPERAMENTS)}
        {select("level", "Swims", SWIM_LEVELS)}
        {select("diet", "Diet", DIETS)}
        {select("coralSafe", "Safe with corals (salt water)", ["true", "false"], "Not known / not salt")}
        {select("invertSafe", "Safe with invertebrates (salt water)", ["true", "false"], "Not known / not salt")}
        <label className="flex items-center gap-2 self-end pb-2 text-sm">
          <input type="checkbox" value="true" {...register("territorial")} /> Holds a territory
        </label>
      </div>
      <Field id="sp-notes" label="Notes, in our own words" error={e.notes?.message}>
        <input id="sp-notes" className={inputStyles} {...register("notes")} />
      </Field>
      <Field id="sp-source" label="Where the values come from" error={e.source?.message} hint="“from memory”, or the handbook's title.">
        <input id="sp-source" className={inputStyles} {...register("source")} />
      </Field>
      <SubmitRow busy={formState.isSubmitting} label={editing ? "Save species" : "Add species"} busyLabel="Saving…" status={status}>
        {editing && (
          <button type="button" className={buttonStyles.secondary} onClick={onDone}>
            Cancel
          </button>
        )}
      </SubmitRow>
    </form>
  );
}
