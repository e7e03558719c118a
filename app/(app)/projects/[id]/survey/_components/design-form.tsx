"use client";
import { useMemo, useState } from "react";
import { useRouter } from "next/navigation";
import { get, type FieldPath } from "react-hook-form";
import { sendJson } from "@/lib/http/send-json";
import { Caution } from "@/components/ui/caution";
import { designFromForm, designToForm, type DesignFormValues } from "@/lib/survey/design-form";
import { loadCheck, type StoredDesign } from "@/lib/survey/load-check";
import type { SiteSurvey } from "@/lib/survey/site-survey.schema";
import { tankDesignSchema } from "@/lib/survey/tank-design.schema";
import { ALL_CAUTIONS } from "@/lib/tank/cautions";
import type { FloorCode } from "@/lib/tank/floor-codes";
import { unitLabel, type UnitSystem } from "@/lib/tank/units";
import { useUnitsForm } from "./use-units-form";
import { FieldGroup, NumberInput, SelectInput } from "./form-bits";
import { LoadCautions, LoadResults } from "./load-results";
import { SubmitRow } from "@/components/ui/submit-row";

const opts = (pairs: [string, string][]) => pairs.map(([value, label]) => ({ value, label }));
const SHAPES = opts([["rectangular", "Rectangular"], ["cylinder", "Cylinder"], ["bowfront", "Bow-front"]]);
const MATERIALS = opts([["glass", "Float glass"], ["low-iron glass", "Low-iron glass"], ["acrylic", "Acrylic"]]);
const WATER = opts([["fresh", "Fresh water"], ["salt", "Salt water"]]);
const SUBSTRATES = opts([["sand", "Sand"], ["gravel", "Gravel"], ["aqua soil", "Aqua soil"], ["none", "None (bare bottom)"]]);
const FOOTPRINTS = opts([["solid", "Solid base"], ["legs", "Legs"]]);
const TOP_EDGES = opts([
  ["free", "Open top: nothing holds the top edge (rimless)"],
  ["braced", "A top frame or brace holds the top edge all round"],
]);

type Path = FieldPath<DesignFormValues>;

/** The tank and stand design, with the load check worked out beside it as you type. */
export function DesignForm(props: { projectId: string; stored: StoredDesign | null; survey: Partial<SiteSurvey> | null; system: UnitSystem; floorCode: FloorCode }) {
  const { projectId, stored, survey, system, floorCode } = props;
  const router = useRouter();
  const [status, setStatus] = useState<{ ok: boolean; text: string } | null>(null);
  const [warnings, setWarnings] = useState<string[]>([]);
  const { register, handleSubmit, formState, setError, watch, getValues, reset } = useUnitsForm<DesignFormValues, StoredDesign>({
    schema: tankDesignSchema,
    stored,
    system,
    toForm: designToForm,
    fromForm: designFromForm,
  });

  const values = watch();
  const live = useMemo(() => {
    const parsed = tankDesignSchema.safeParse(designFromForm(values, system, stored));
    return parsed.success ? { results: loadCheck(parsed.data as StoredDesign, survey, floorCode) } : { problems: parsed.error.issues.map((i) => i.message) };
  }, [values, system, stored, survey, floorCode]);

  const e = formState.errors;
  const u = { length: unitLabel("length", system), mass: unitLabel("mass", system), volume: unitLabel("volume", system), temp: unitLabel("temperature", system) };
  const num = (path: Path, label: string, hint?: string) => (
    <NumberInput id={`design-${path.replaceAll(".", "-")}`} label={label} reg={register(path)} error={get(e, path)} hint={hint} />
  );
  const select = (path: Path, label: string, options: { value: string; label: string }[]) => (
    <SelectInput id={`design-${path.replaceAll(".", "-")}`} label={label} reg={register(path)} error={get(e, path)} options={options} />
  );

  const onSubmit = handleSubmit(
    async (design) => {
      setStatus(null);
      const res = await sendJson<{ warnings: string[] }>(`/api/projects/${projectId}/design`, "PUT", design);
      if (!res.ok) {
        for (const [field, message] of Object.entries(res.fields ?? {})) setError(field as Path, { message });
        setStatus({ ok: false, text: `${res.error} Nothing was saved; your entries are still here.` });
        return;
      }
      setWarnings(res.data.warnings);
      setStatus({ ok: true, text: "Design saved." });
      router.refresh();
    },
    () => setStatus({ ok: false, text: "Some entries need attention (marked in the form). Nothing was saved yet." }),
  );

  const shape = values.shape;
  const standGroupError = (get(e, "stand") as { message?: string } | undefined)?.message ?? (get(e, "stand.footprint") as { message?: string } | undefined)?.message;
  return (
    <div className="grid gap-5 xl:grid-cols-[minmax(0,1fr)_minmax(0,26rem)]">
      <form onSubmit={onSubmit} noValidate aria-labelledby="design-heading" className="flex flex-col gap-5 rounded-2xl border border-line bg-card p-5">
        <h2 id="design-heading" className="text-lg font-semibold">
          Tank and stand design
        </h2>
        <FieldGroup title="Tank" hint="Outside sizes.">
          {select("shape", "Shape", SHAPES)}
          {shape === "cylinder" ? num("diameterMm", `Diameter (${u.length})`) : num("lengthMm", `Length (${u.length})`)}
          {shape !== "cylinder" && num("widthMm", shape === "bowfront" ? `Depth at the ends (${u.length})` : `Depth, front to back (${u.length})`)}
          {shape === "bowfront" && num("bowDepthMm", `Bow depth (${u.length})`, "Extra depth at the middle of the curved front.")}
          {num("heightMm", `Height (${u.length})`)}
        </FieldGroup>
        <FieldGroup title="Panels">
          {select("panelMaterial", "Panel material", MATERIALS)}
          <div className="sm:col-span-2">{select("topEdge", "How is the top edge of the walls held?", TOP_EDGES)}</div>
          {num("panelThicknessMm", `Panel thickness (${u.length})`)}
          {num("bottomThicknessMm", `Bottom thickness (${u.length}, optional)`, "Leave empty when the same as the sides.")}
        </FieldGroup>
        <FieldGroup title="Water">
          {num("waterBelowRimMm", `Water level below the rim (${u.length})`)}
          {select("water", "Water", WATER)}
          {values.water === "salt" && num("salinityPsu", "Salinity (psu, optional)", "Natural seawater is about 35.")}
          {num("temperatureC", `Water temperature (${u.temp})`)}
        </FieldGroup>
        <FieldGroup title="Contents">
          {select("substrate.type", "Substrate", SUBSTRATES)}
          {values.substrate?.type !== "none" && num("substrate.depthMm", `Substrate depth (${u.length})`)}
          {num("rockMassKg", `Rock (${u.mass})`)}
          {num("sumpVolumeL", `Sump water (${u.volume})`)}
        </FieldGroup>
        <FieldGroup title="Stand">
          {num("stand.massKg", `Stand weight (${u.mass})`, "Include the sump's glass, pumps, lights and cabinet contents.")}
          {num("stand.lengthMm", `Stand length (${u.length})`)}
          {num("stand.widthMm", `Stand depth (${u.length})`)}
          {num("stand.heightMm", `Stand height (${u.length}, optional)`, "Used only to check the way in.")}
          {select("stand.footprint.kind", "Stand stands on", FOOTPRINTS)}
          {values.stand?.footprint?.kind === "legs" ? (
            <>
              {num("stand.footprint.count", "Number of legs")}
              {num("stand.footprint.legLengthMm", `Each leg's foot, length (${u.length})`)}
              {num("stand.footprint.legWidthMm", `Each leg's foot, width (${u.length})`)}
            </>
          ) : (
            <>
              {num("stand.footprint.lengthMm", `Base length (${u.length})`)}
              {num("stand.footprint.widthMm", `Base depth (${u.length})`)}
            </>
          )}
          {standGroupError && <p className="text-sm font-medium text-danger sm:col-span-2">{standGroupError}</p>}
        </FieldGroup>
        <SubmitRow busy={formState.isSubmitting} label="Save design" busyLabel="Saving…" status={status} />
        {warnings.map((w) => (
          <Caution key={w}>{w}</Caution>
        ))}
      </form>

      <aside aria-labelledby="results-heading" className="flex flex-col gap-3 rounded-2xl border border-line bg-card p-5 xl:sticky xl:top-16 xl:self-start">
        <h2 id="results-heading" className="text-lg font-semibold">
          Load check
        </h2>
        {"results" in live && live.results ? (
          <LoadResults results={live.results} system={system} />
        ) : (
          <>
            <p className="text-sm text-muted">The figures appear here once the design's sizes are filled in and make sense.</p>
            {values.lengthMm || values.diameterMm ? (
              <ul className="list-disc pl-5 text-sm text-ink/80" data-testid="design-problems">
                {[...new Set(live.problems)].slice(0, 6).map((p) => (
                  <li key={p}>{p}</li>
                ))}
              </ul>
            ) : null}
            <LoadCautions cautions={ALL_CAUTIONS} />
          </>
        )}
      </aside>
    </div>
  );
}
