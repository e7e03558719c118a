import type { ReactNode } from "react";
import type { FloorScreenResult } from "@/lib/tank/floor";
import { FLOOR_CODE_VALUES } from "@/lib/tank/floor-codes";
import { formatForce, formatMoment, formatPressure, formatQuantity, formatShare } from "@/lib/survey/format";
import type { UnitSystem } from "@/lib/tank/units";

const VERDICT = {
  under: { label: "Within the screening allowance", cls: "bg-ok-soft text-ok" },
  over: { label: "Over the screening allowance", cls: "bg-caution-soft text-caution" },
  "far over": { label: "Far over the screening allowance", cls: "bg-danger-soft text-danger" },
  "not screened": { label: "Not screened: the engineer decides", cls: "bg-caution-soft text-caution" },
} as const;

function Line({ label, children, testId }: { label: string; children: ReactNode; testId?: string }) {
  return (
    <div className="flex justify-between gap-3 border-b border-line/60 py-1 last:border-0">
      <dt className="text-muted">{label}</dt>
      <dd className="num text-right font-medium" data-testid={testId}>
        {children}
      </dd>
    </div>
  );
}

/** The floor screening's verdict, its figures in the reader's units, where they come from, and the cautions. */
export function FloorScreening({ floor, system }: { floor: FloorScreenResult; system: UnitSystem }) {
  const code = FLOOR_CODE_VALUES[floor.code];
  const j = floor.joists;
  return (
    <div className="flex flex-col gap-2">
      <p className="flex flex-wrap items-center gap-2">
        <span className={`rounded-full px-2.5 py-0.5 text-xs font-semibold ${VERDICT[floor.verdict].cls}`} data-testid="floor-verdict">
          {VERDICT[floor.verdict].label}
        </span>
        {floor.ratio !== null && (
          <span className="num text-muted" data-testid="floor-share">
            uses {formatShare(floor.ratio)} of the allowance
          </span>
        )}
      </p>
      <dl>
        <Line label={`Code: ${code.name}`} testId="floor-live-load">
          {formatPressure(floor.ratedKPa, system)} live load ({floor.roomUse === "sleeping" ? "sleeping room" : "living area"})
        </Line>
        {j && !j.beyondSpan && (
          <>
            <Line label="Joists under the stand (safe side)">{j.joistsUnder}</Line>
            <Line label="Load on the most loaded joist" testId="joist-load">
              {formatForce(j.loadKN, system)} at {formatQuantity("length", j.positionMm, system)} from the support
            </Line>
            <Line label="Bending moment: tank / allowance" testId="joist-moment">
              {formatMoment(j.momentKNm, system)} / {formatMoment(j.allowMomentKNm, system)} ({formatShare(j.momentShare)})
            </Line>
            <Line label="End shear: tank / allowance" testId="joist-shear">
              {formatForce(j.shearKN, system)} / {formatForce(j.allowShearKN, system)} ({formatShare(j.shearShare)})
            </Line>
          </>
        )}
        {floor.slab && (
          <Line label="Footprint pressure / ground's bearing value" testId="slab-pressure">
            {formatPressure(floor.slab.pressureKPa, system)} / {formatPressure(floor.slab.bearingKPa, system)}
          </Line>
        )}
      </dl>
      <ul className="list-disc pl-5 text-ink/80">
        {floor.messages.map((m) => (
          <li key={m}>{m}</li>
        ))}
      </ul>
      {floor.sources.length > 0 && (
        <p className="text-xs text-muted" data-testid="floor-sources">
          Sources: {floor.sources.join("; ")}.
        </p>
      )}
      <p className="text-xs text-caution" data-testid="floor-cautions">
        {floor.cautions.join(" ")}
      </p>
    </div>
  );
}
