"use client";
import { useState } from "react";
import { useForm, type Resolver } from "react-hook-form";
import { format } from "date-fns";
import { sendJson } from "@/lib/http/send-json";
import { substrateQuantity } from "@/lib/tank/materials";
import { SUBSTRATE_PROPERTIES } from "@/lib/tank/densities";
import { fromDisplay, toDisplay, unitLabel, type UnitSystem } from "@/lib/tank/units";
import { Field } from "@/components/ui/field";
import { buttonStyles, inputStyles } from "@/components/ui/button-styles";
import type { NewMaterial } from "@/app/api/projects/[id]/materials/material.schema";

/**
 * The van-list form's checks (its zod schema, and zod with it) load when the form is first checked,
 * not with install day: the page is opened on a phone on site, often on a poor connection.
 */
const materialResolver: Resolver<NewMaterial> = async (values, context, options) => {
  const [{ zodResolver }, { newMaterialSchema }] = await Promise.all([import("@hookform/resolvers/zod"), import("@/app/api/projects/[id]/materials/material.schema")]);
  return (zodResolver(newMaterialSchema) as unknown as Resolver<NewMaterial>)(values, context, options);
};

type Material = { id: string; label: string; quantity: number; unit: string; loadedAt: string | null; loadedByName: string | null };
type Prefill = { lengthMm: number | null; widthMm: number | null; note: string | null; substrate: string | null; depthMm: number | null; rockMassKg: number | null };
type SubstrateKind = "sand" | "gravel" | "aqua soil";

const fmt = (v: number, digits = 1) => v.toLocaleString(undefined, { maximumFractionDigits: digits });

/** Substrate and rock quantities for the bed, and the van list ticked as it is loaded. */
export function MaterialsPanel({ projectId, units, initial, prefill }: { projectId: string; units: UnitSystem; initial: Material[]; prefill: Prefill }) {
  const [list, setList] = useState(initial);
  const [error, setError] = useState<string | null>(null);
  const len = unitLabel("length", units);
  const show = (mm: number | null) => (mm === null ? "" : String(Math.round(toDisplay("length", mm, units) * 10) / 10));
  const [lengthIn, setLength] = useState(show(prefill.lengthMm));
  const [widthIn, setWidth] = useState(show(prefill.widthMm));
  const [depthIn, setDepth] = useState(show(prefill.depthMm ?? 50));
  const [kind, setKind] = useState<SubstrateKind>((prefill.substrate as SubstrateKind) ?? "sand");
  const [bagKg, setBagKg] = useState("10");
  const [rockIn, setRock] = useState(prefill.rockMassKg !== null ? String(Math.round(toDisplay("mass", prefill.rockMassKg, units) * 10) / 10) : "");

  const n = (s: string) => Number(s.replace(",", "."));
  const l = fromDisplay("length", n(lengthIn), units);
  const w = fromDisplay("length", n(widthIn), units);
  const d = fromDisplay("length", n(depthIn), units);
  const bag = fromDisplay("mass", n(bagKg), units);
  const valid = [l, w, d].every((x) => Number.isFinite(x) && x > 0 && x < 10_000) && bag > 0;
  // The list keeps rock in kg whatever the user's units, like every stored mass.
  const rockKg = fromDisplay("mass", n(rockIn), units);
  const q = valid ? substrateQuantity({ footprintLengthMm: l, footprintWidthMm: w, depthMm: d, bulkDensityKgM3: SUBSTRATE_PROPERTIES[kind].bulkDensityKgM3, bagSizeKg: bag }) : null;

  const { register, handleSubmit, formState, reset, setError: setFieldError } = useForm<NewMaterial>({ resolver: materialResolver, defaultValues: { label: "", unit: "" } });

  async function add(values: NewMaterial) {
    setError(null);
    const res = await sendJson<{ material: Material }>(`/api/projects/${projectId}/materials`, "POST", values);
    if (!res.ok) {
      for (const [f, m] of Object.entries(res.fields ?? {})) setFieldError(f as keyof NewMaterial, { message: m });
      setError(res.error);
      return false;
    }
    setList((x) => [...x, { ...res.data.material, loadedAt: null, loadedByName: null }]);
    return true;
  }

  async function toggle(m: Material) {
    setError(null);
    const res = await sendJson<{ material: { loadedAt: string | null } }>(`/api/projects/${projectId}/materials/${m.id}`, "PATCH", { loaded: !m.loadedAt });
    if (!res.ok) return setError(res.error);
    setList((x) => x.map((y) => (y.id === m.id ? { ...y, loadedAt: res.data.material.loadedAt, loadedByName: res.data.material.loadedAt ? "you" : null } : y)));
  }

  const e = formState.errors;
  return (
    <section aria-labelledby="materials-heading" className="flex flex-col gap-4 rounded-2xl border border-line bg-card p-4">
      <h2 id="materials-heading" className="text-lg font-semibold">
        Aquascape materials
      </h2>
      <div className="grid grid-cols-2 gap-3">
        <Field id="bed-length" label={`Bed length (${len})`}>
          <input id="bed-length" inputMode="decimal" className={`${inputStyles} min-h-11`} value={lengthIn} onChange={(ev) => setLength(ev.target.value)} />
        </Field>
        <Field id="bed-width" label={`Bed depth front to back (${len})`}>
          <input id="bed-width" inputMode="decimal" className={`${inputStyles} min-h-11`} value={widthIn} onChange={(ev) => setWidth(ev.target.value)} />
        </Field>
        <Field id="bed-depth" label={`Substrate depth (${len})`}>
          <input id="bed-depth" inputMode="decimal" className={`${inputStyles} min-h-11`} value={depthIn} onChange={(ev) => setDepth(ev.target.value)} />
        </Field>
        <Field id="bed-kind" label="Substrate">
          <select id="bed-kind" className={`${inputStyles} min-h-11`} value={kind} onChange={(ev) => setKind(ev.target.value as SubstrateKind)}>
            <option value="sand">Sand</option>
            <option value="gravel">Gravel</option>
            <option value="aqua soil">Aqua soil</option>
          </select>
        </Field>
        <Field id="bag-size" label={`Bag size (${unitLabel("mass", units)})`}>
          <input id="bag-size" inputMode="decimal" className={`${inputStyles} min-h-11`} value={bagKg} onChange={(ev) => setBagKg(ev.target.value)} />
        </Field>
      </div>
      {prefill.note && <p className="text-xs text-muted">{prefill.note}</p>}
      {q ? (
        <div className="flex flex-wrap items-center gap-3 rounded-lg bg-paper p-3 text-sm" data-testid="substrate-result">
          <span className="tabular-nums">
            {fmt(toDisplay("volume", q.volumeL, units))} {unitLabel("volume", units)} · {fmt(toDisplay("mass", q.massKg, units))} {unitLabel("mass", units)} ·{" "}
            <strong>{q.bags} bags</strong>
          </span>
          <button type="button" className={`${buttonStyles.secondary} min-h-11`} onClick={() => void add({ label: `${kind[0].toUpperCase()}${kind.slice(1)}, ${bagKg} ${unitLabel("mass", units)} bags`, quantity: q.bags!, unit: "bags" })}>
            Add to the list
          </button>
          <p className="w-full text-xs text-muted">Bed density {SUBSTRATE_PROPERTIES[kind].bulkDensityKgM3} kg/m³, a typical figure; the bag label's own figure wins.</p>
        </div>
      ) : (
        <p className="text-sm text-muted">Enter the bed&apos;s length, depth front to back and substrate depth to work out the bags.</p>
      )}
      <div className="flex flex-wrap items-end gap-3">
        <Field id="rock-mass" label={`Rock (${unitLabel("mass", units)})`} hint={prefill.rockMassKg !== null ? "From the tank design." : "Weigh it at the yard, or estimate from the design."}>
          <input id="rock-mass" inputMode="decimal" className={`${inputStyles} min-h-11`} value={rockIn} onChange={(ev) => setRock(ev.target.value)} />
        </Field>
        <button
          type="button"
          className={`${buttonStyles.secondary} min-h-11`}
          disabled={!(rockKg > 0)}
          onClick={() => void add({ label: "Aquascape rock", quantity: Math.round(rockKg * 10) / 10, unit: "kg" })}
        >
          Add rock to the list
        </button>
        <p className="w-full text-xs text-muted">Lift heavy pieces with two people and set them on the base layer, never against a panel.</p>
      </div>

      <ul className="flex flex-col gap-2" data-testid="materials-list">
        {list.length === 0 && <li className="text-sm text-muted">No materials listed yet.</li>}
        {list.map((m) => (
          <li key={m.id} className="flex items-center gap-3 rounded-lg border border-line p-2">
            <button type="button" onClick={() => void toggle(m)} aria-pressed={!!m.loadedAt} className={`${m.loadedAt ? buttonStyles.primary : buttonStyles.secondary} min-h-11 min-w-24`}>
              {m.loadedAt ? "Loaded" : "Load"}
            </button>
            <span className="flex-1 text-sm">
              <span className="font-medium">{m.label}</span> · <span className="tabular-nums">{fmt(m.quantity, 2)} {m.unit}</span>
              {m.loadedAt && (
                <span className="block text-xs text-muted">
                  In the van{m.loadedByName ? ` (${m.loadedByName})` : ""}, {format(new Date(m.loadedAt), "d MMM HH:mm")}
                </span>
              )}
            </span>
          </li>
        ))}
      </ul>
      <form noValidate aria-label="Add a material" className="grid grid-cols-2 gap-3" onSubmit={handleSubmit(async (v) => (await add(v)) && reset())}>
        <div className="col-span-2">
          <Field id="mat-label" label="Material" error={e.label?.message}>
            <input id="mat-label" className={`${inputStyles} min-h-11`} aria-invalid={!!e.label} {...register("label")} />
          </Field>
        </div>
        <Field id="mat-qty" label="Quantity" error={e.quantity?.message}>
          <input id="mat-qty" inputMode="decimal" className={`${inputStyles} min-h-11`} aria-invalid={!!e.quantity} {...register("quantity", { valueAsNumber: true })} />
        </Field>
        <Field id="mat-unit" label="Unit" error={e.unit?.message}>
          <input id="mat-unit" className={`${inputStyles} min-h-11`} placeholder="bags, kg, pieces" aria-invalid={!!e.unit} {...register("unit")} />
        </Field>
        <button type="submit" className={`${buttonStyles.secondary} col-span-2 min-h-11`} disabled={formState.isSubmitting}>
          Add material
        </button>
      </form>
      {error && (
        <p role="alert" className="text-sm font-medium text-danger">
          {error}
        </p>
      )}
    </section>
  );
}
