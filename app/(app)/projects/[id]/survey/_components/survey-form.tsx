"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { sendJson } from "@/lib/http/send-json";
import { buttonStyles } from "@/components/ui/button-styles";
import { siteSurveySchema, type SiteSurvey, type SurveyField } from "@/lib/survey/site-survey.schema";
import { SURVEY_FIELD_LABELS, requiredSurveyFields, surveyMissingFields } from "@/lib/survey/survey-missing";
import { surveyFromForm, surveyToForm, type SurveyFormValues } from "@/lib/survey/survey-form";
import { unitLabel, type UnitSystem } from "@/lib/tank/units";
import { useUnitsForm } from "./use-units-form";
import { FieldGroup, NumberInput, SelectInput, TextInput, withBlank } from "./form-bits";

const opts = (pairs: [string, string][]) => pairs.map(([value, label]) => ({ value, label }));
const FLOOR = opts([
  ["timber joists", "Timber joists (suspended timber floor)"],
  ["concrete slab", "Concrete slab on the ground"],
  ["suspended concrete", "Suspended concrete (beams, planks or a slab above a space)"],
  ["raised", "Raised floor on joists"],
  ["other", "Other or not known"],
]);
const JOISTS = opts([["perpendicular", "Across the tank's long side"], ["parallel", "Along the tank's long side"], ["unknown", "Not known yet"]]);
const LEVEL = opts([["basement", "Basement"], ["ground", "Ground floor"], ["upper", "Upper floor"]]);
const ROOM = opts([["living", "Living area"], ["sleeping", "Sleeping room"]]);
const YNU = opts([["yes", "Yes"], ["no", "No"], ["unknown", "Not known"]]);
const YN = opts([["yes", "Yes"], ["no", "No"]]);
const SUN = opts([["none", "None"], ["some", "Some (morning or evening)"], ["strong", "Strong (midday)"]]);

type Status = { tone: "ok" | "caution" | "danger"; text: string } | null;

/** The site survey. Saves a draft whatever is filled in; names the required fields still empty. */
export function SurveyForm({ projectId, stored, system }: { projectId: string; stored: Partial<SiteSurvey> | null; system: UnitSystem }) {
  const router = useRouter();
  const [status, setStatus] = useState<Status>(null);
  const { register, handleSubmit, formState, setError, watch, getValues, reset } = useUnitsForm<SurveyFormValues, Partial<SiteSurvey>>({
    schema: siteSurveySchema,
    stored,
    system,
    toForm: surveyToForm,
    fromForm: surveyFromForm,
  });

  const floorType = watch("floorType");
  const values = watch();
  const required = new Set(requiredSurveyFields({ floorType: (floorType || undefined) as SiteSurvey["floorType"] }));
  const missing = surveyMissingFields(surveyFromForm(values, system, stored) as Partial<SiteSurvey>);
  const mm = unitLabel("length", system);
  const e = formState.errors;
  const reg = (f: SurveyField) => ({ id: `survey-${f}`, reg: register(f), error: e[f], required: required.has(f) });
  const len = (f: SurveyField, label = SURVEY_FIELD_LABELS[f], hint?: string) => <NumberInput {...reg(f)} label={`${label} (${mm})`} hint={hint} />;

  const onSubmit = handleSubmit(async (data) => {
    setStatus(null);
    const res = await sendJson<{ complete: boolean; missingLabels: string[] }>(`/api/projects/${projectId}/survey`, "PUT", data);
    if (!res.ok) {
      for (const [field, message] of Object.entries(res.fields ?? {})) setError(field as SurveyField, { message });
      setStatus({ tone: "danger", text: `${res.error} Nothing was lost: your entries are still here.` });
      return;
    }
    setStatus(
      res.data.complete
        ? { tone: "ok", text: "Survey saved and complete: the project can go on to the stand & load check." }
        : { tone: "caution", text: `Draft saved. Still needed to complete it: ${res.data.missingLabels.join(", ")}.` },
    );
    router.refresh();
  }, () => setStatus({ tone: "danger", text: "Some entries need attention (marked below). Nothing was saved yet." }));

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="survey-heading" className="flex flex-col gap-5 rounded-2xl border border-line bg-card p-5">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 id="survey-heading" className="text-lg font-semibold">
          Site survey
        </h2>
        <p className="text-xs text-muted" data-testid="survey-missing">
          {missing.length === 0 ? "All required fields are filled in." : `${missing.length} required field${missing.length === 1 ? "" : "s"} still empty.`}
        </p>
      </div>

      <FieldGroup title="Room and floor">
        <SelectInput {...reg("roomUse")} label="Room use" options={withBlank(ROOM)} hint="Sleeping rooms are designed for a lower floor load." />
        <SelectInput {...reg("floorType")} label="Floor type" options={withBlank(FLOOR)} />
        <SelectInput {...reg("floorLevel")} label="Floor level" options={withBlank(LEVEL)} />
        {len("roomLengthMm")}
        {len("roomWidthMm")}
        {len("ceilingHeightMm")}
        {required.has("joistDirection") && (
          <>
            <SelectInput {...reg("joistDirection")} label="Joist direction" options={withBlank(JOISTS)} hint="Relative to the tank's long side." />
            {len("joistSpanMm", "Joist span", "Between the supports under the joists.")}
            {len("joistSpacingMm", "Joist spacing", "Centre to centre.")}
            <TextInput {...reg("joistSize")} label="Joist size" hint="As found, e.g. 47 × 195 mm." />
            {len("bearingWallDistanceMm", "Distance from a load-bearing wall", "From the nearest wall or beam the joists rest on to the stand's near edge; 0 when it stands against one.")}
          </>
        )}
      </FieldGroup>

      <FieldGroup title="Way in">
        {len("doorWidthMm", "Narrowest door width", "Clear opening with the door open.")}
        {len("doorHeightMm", "Narrowest door height")}
        <SelectInput {...reg("stairs")} label="Stairs on the way in" options={withBlank(YN)} />
        <NumberInput {...reg("turns")} label="Turns on the way in" />
        <TextInput {...reg("accessNotes")} label="Access notes" multiline />
      </FieldGroup>

      <FieldGroup title="Power and water" hint="Electrical work near water is for a licensed electrician under local codes.">
        <NumberInput {...reg("outletsWithinReach")} label="Outlets within reach" />
        <SelectInput {...reg("groundFaultProtection")} label="Ground-fault protection" options={withBlank(YNU)} />
        <SelectInput {...reg("dedicatedCircuit")} label="Dedicated circuit" options={withBlank(YNU)} />
        {len("waterSupplyDistanceMm")}
        {len("drainDistanceMm")}
      </FieldGroup>

      <FieldGroup title="Sun and heat">
        <SelectInput {...reg("sunExposure")} label="Direct sun" options={withBlank(SUN)} />
        <TextInput {...reg("heatSources")} label="Heat sources" hint="Radiators, fires, vents near the spot." />
        <TextInput {...reg("notes")} label="Notes" multiline />
      </FieldGroup>

      <div className="flex flex-wrap items-center gap-3">
        <button type="submit" className={buttonStyles.primary} disabled={formState.isSubmitting}>
          {formState.isSubmitting ? "Saving…" : "Save survey"}
        </button>
        {status && (
          <p role="status" className={`text-sm ${{ ok: "text-ok", caution: "text-caution", danger: "text-danger" }[status.tone]}`}>
            {status.text}
          </p>
        )}
      </div>
    </form>
  );
}
