import type { StoredDesign } from "@/lib/survey/load-check";
import type { SiteSurvey } from "@/lib/survey/site-survey.schema";
import { SURVEY_FIELD_LABELS } from "@/lib/survey/survey-missing";
import { formatQuantity } from "@/lib/survey/format";
import type { UnitSystem } from "@/lib/tank/units";

const SHAPE = { rectangular: "Rectangular", cylinder: "Cylinder", bowfront: "Bow-front" } as const;

function Pairs({ rows }: { rows: [string, string][] }) {
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-0.5 text-sm">
      {rows.map(([k, v]) => (
        <div key={k} className="contents">
          <dt className="text-muted">{k}</dt>
          <dd className="num">{v}</dd>
        </div>
      ))}
    </dl>
  );
}

/** The design's inputs as the sheet prints them, in the reader's units. */
export function DesignInputs({ design, system }: { design: StoredDesign; system: UnitSystem }) {
  const len = (mm: number) => formatQuantity("length", mm, system, system === "metric" ? (mm < 100 ? 1 : 0) : 2);
  const size =
    design.shape === "cylinder"
      ? `Ø ${len(design.diameterMm)} × ${len(design.heightMm)} high`
      : design.shape === "bowfront"
        ? `${len(design.lengthMm)} × ${len(design.widthMm)} (+${len(design.bowDepthMm)} bow) × ${len(design.heightMm)} high`
        : `${len(design.lengthMm)} × ${len(design.widthMm)} × ${len(design.heightMm)} high`;
  const fp = design.stand.footprint;
  const rows: [string, string][] = [
    ["Shape", SHAPE[design.shape]],
    ["Outside size", size],
    ["Top edge", (design.topEdge ?? "free") === "free" ? "open top, nothing holds the top edge" : "held by a top frame or brace"],
    ["Panels", `${design.panelMaterial}, ${len(design.panelThicknessMm)}${design.bottomThicknessMm ? `, bottom ${len(design.bottomThicknessMm)}` : ""}`],
    ["Water", `${design.water}${design.water === "salt" ? ` (${design.salinityPsu ?? 35} psu)` : ""}, ${formatQuantity("temperature", design.temperatureC, system)}, ${len(design.waterBelowRimMm)} below the rim`],
    ["Substrate", design.substrate.type === "none" ? "none" : `${design.substrate.type}, ${len(design.substrate.depthMm)} deep`],
    ["Rock", formatQuantity("mass", design.rockMassKg, system)],
    ["Sump water", formatQuantity("volume", design.sumpVolumeL, system)],
    ["Stand", `${len(design.stand.lengthMm)} × ${len(design.stand.widthMm)}${design.stand.heightMm ? ` × ${len(design.stand.heightMm)} high` : ""}, ${formatQuantity("mass", design.stand.massKg, system)}`],
    ["Stand on the floor", fp.kind === "solid" ? `solid base ${len(fp.lengthMm)} × ${len(fp.widthMm)}` : `${fp.count} legs, each ${len(fp.legLengthMm)} × ${len(fp.legWidthMm)}`],
  ];
  return <Pairs rows={rows} />;
}

/** The survey answers the load check relies on. */
export function SurveyInputs({ survey, system }: { survey: Partial<SiteSurvey>; system: UnitSystem }) {
  const rows: [string, string][] = [];
  const add = (f: keyof SiteSurvey, text: string | null, label = SURVEY_FIELD_LABELS[f]) => {
    if (text) rows.push([label, text]);
  };
  const len = (v: number | null | undefined) => (v === null || v === undefined ? null : formatQuantity("length", v, system));
  add("roomUse", survey.roomUse === "sleeping" ? "sleeping room" : survey.roomUse === "living" ? "living area" : null);
  add("floorType", survey.floorType ?? null);
  add("floorLevel", survey.floorLevel ?? null);
  add("roomLengthMm", survey.roomLengthMm && survey.roomWidthMm ? `${len(survey.roomLengthMm)} × ${len(survey.roomWidthMm)}` : null, "Room");
  add("joistDirection", survey.joistDirection ? `${survey.joistDirection} to the tank's long side` : null);
  add("joistSpanMm", len(survey.joistSpanMm));
  add("joistSpacingMm", len(survey.joistSpacingMm));
  add("joistSize", survey.joistSize ?? null);
  add("bearingWallDistanceMm", len(survey.bearingWallDistanceMm));
  add("doorWidthMm", survey.doorWidthMm && survey.doorHeightMm ? `${len(survey.doorWidthMm)} wide × ${len(survey.doorHeightMm)} high` : null, "Narrowest door");
  add("stairs", survey.stairs === undefined || survey.stairs === null ? null : survey.stairs ? "yes" : "no");
  if (!rows.length) return <p className="text-sm text-muted">No survey recorded yet.</p>;
  return <Pairs rows={rows} />;
}
