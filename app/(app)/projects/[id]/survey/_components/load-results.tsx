import type { ReactNode } from "react";
import { Caution } from "@/components/ui/caution";
import type { LoadCheckResults } from "@/lib/survey/load-check";
import { formatArea, formatBoth, formatDensity, formatNumber, formatPressure, formatQuantity, formatThickness } from "@/lib/survey/format";
import { DEFAULT_GLASS_SAFETY_FACTOR, ACRYLIC_DESIGN_STRESS_MPA, FLOAT_GLASS_MODULUS_OF_RUPTURE_MPA } from "@/lib/tank/glass-strength";
import type { UnitSystem } from "@/lib/tank/units";
import { FloorScreening } from "./floor-screening";
import { accessMessage } from "@/lib/tank/access";

/** 1 psi = 6.894757 kPa (NIST Handbook 44, Appendix C: 1 lbf/in² = 4.4482216152605 N / 0.00064516 m²). */
const MPA_PER_PSI = 0.0068947572931683613;

const TOP_EDGE_WORDS = { free: "open top (top edge free)", braced: "top frame or brace (top edge held)" } as const;

function Row({ label, children, testId }: { label: string; children: ReactNode; testId?: string }) {
  return (
    <div className="flex justify-between gap-3 border-b border-line/60 py-1 last:border-0">
      <dt className="text-muted">{label}</dt>
      <dd className="num text-right font-medium" data-testid={testId}>
        {children}
      </dd>
    </div>
  );
}

function Block({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section className="flex flex-col gap-1 break-inside-avoid">
      <h3 className="text-sm font-semibold uppercase tracking-wide text-muted">{title}</h3>
      {children}
    </section>
  );
}

/** The load check's figures and verdicts, for the section page (live) and the printable sheet. */
export function LoadResults(props: { results: LoadCheckResults; system: UnitSystem; showCautions?: boolean; twoColumns?: boolean }) {
  const { results, system, showCautions = true, twoColumns = false } = props;
  const { load, floor, glass, access } = results;
  const mass = (kg: number) => formatQuantity("mass", kg, system);
  // Clearances never overstate a fit: spare room rounds down, a shortfall up (whole mm, or 0.1 in).
  const gap = (mm: number, round: "down" | "up") => {
    const step = system === "metric" ? 1 : 2.54;
    const v = (round === "down" ? Math.floor(mm / step + 1e-6) : Math.ceil(mm / step - 1e-6)) * step;
    return formatQuantity("length", v, system);
  };
  const stress = (mpa: number) => (system === "metric" ? `${mpa} MPa` : `${formatNumber(mpa / MPA_PER_PSI, 0)} psi`);
  const leftBlocks = (
    <>
      <Block title="Water">
        <dl>
          <Row label="Gross volume (bottom to rim)">{formatBoth("volume", load.grossVolumeL, system)}</Row>
          <Row label="Net water volume" testId="net-volume">
            {formatBoth("volume", load.netVolumeL, system)}
          </Row>
          <Row label="Water density">{formatDensity(load.waterDensityKgM3, system)}</Row>
        </dl>
      </Block>

      <Block title="Weight">
        <dl>
          <Row label="Water">{mass(load.waterMassKg)}</Row>
          <Row label="Panels">{mass(load.glassMassKg)}</Row>
          <Row label="Substrate">{mass(load.substrateMassKg)}</Row>
          <Row label="Rock">{mass(load.rockMassKg)}</Row>
          <Row label="Sump water">{mass(load.sumpWaterMassKg)}</Row>
          <Row label="Stand">{mass(load.standMassKg)}</Row>
          <Row label="Total installed" testId="total-mass">
            <strong>{formatBoth("mass", load.totalInstalledMassKg, system)}</strong>
          </Row>
        </dl>
      </Block>

      <Block title="On the floor">
        <dl>
          <Row label="Stand footprint">{formatArea(load.footprintAreaM2, system)}</Row>
          <Row label="Floor pressure" testId="floor-pressure">
            {formatPressure(load.floorPressureKPa, system)}
          </Row>
          {load.loadPerLegKg !== null && <Row label="Load per leg">{formatBoth("mass", load.loadPerLegKg, system)}</Row>}
          {load.legContactPressureKPa !== null && <Row label="Pressure under each leg">{formatPressure(load.legContactPressureKPa, system)}</Row>}
        </dl>
      </Block>

      <Block title="Floor screening">
        {floor ? <FloorScreening floor={floor} system={system} /> : <p className="text-muted">Fill in the room use and floor type in the survey to screen the floor.</p>}
      </Block>

    </>
  );
  const rightBlocks = (
    <>
      <Block title="Through the narrowest door">
        {access ? (
          <dl>
            <Row label={`Door ${formatQuantity("length", access.doorWidthMm, system)} × ${formatQuantity("length", access.doorHeightMm, system)}`}>{""}</Row>
            <Row label="Tank" testId="access-tank">
              <span className={access.tank.fits ? "" : "text-danger"}>{accessMessage(access.tank, gap)}</span>
            </Row>
            <Row label="Stand">
              {access.stand ? <span className={access.stand.fits ? "" : "text-danger"}>{accessMessage(access.stand, gap)}</span> : <span className="text-muted">Enter the stand height to check it.</span>}
            </Row>
          </dl>
        ) : (
          <p className="text-muted">Fill in the narrowest door's width and height in the survey to check the way in.</p>
        )}
      </Block>

      <Block title="Panel thickness">
        <p className="text-muted" data-testid="top-edge">
          Top edge: {TOP_EDGE_WORDS[glass.topEdge ?? "free"]}
        </p>
        <table className="w-full text-left">
          <thead className="text-xs text-muted">
            <tr>
              <th className="py-1 font-medium">Panel</th>
              <th className="py-1 text-right font-medium">Needs</th>
              <th className="py-1 text-right font-medium">Entered</th>
              <th className="py-1 text-right font-medium">Verdict</th>
            </tr>
          </thead>
          <tbody>
            {glass.panels.map((p) => (
              <tr key={p.panel} className="border-t border-line/60" data-testid={`panel-${p.panel}`}>
                <td className="py-1">{p.panel[0].toUpperCase() + p.panel.slice(1)}</td>
                <td className="num py-1 text-right">
                  {p.lowerBound ? "at least " : ""}
                  {formatThickness(p.requiredMm, system)}
                </td>
                <td className="num py-1 text-right">{formatThickness(p.enteredMm, system)}</td>
                <td className={`py-1 text-right font-semibold ${p.ok ? "text-ok" : "text-danger"}`}>
                  {p.ok ? "Enough" : p.lowerBound && p.enteredMm >= p.requiredMm ? "Past the table" : "Too thin"}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
        <ul className="list-disc pl-5 text-ink/80">
          {[...new Set(glass.panels.flatMap((p) => p.notes ?? []))].map((n) => (
            <li key={n}>{n}</li>
          ))}
        </ul>
        <p className="text-xs text-muted" data-testid="glass-sources">
          Walls checked full to the rim. Glass: modulus of rupture {stress(FLOAT_GLASS_MODULUS_OF_RUPTURE_MPA)} with a safety factor of {DEFAULT_GLASS_SAFETY_FACTOR} (common
          practice); acrylic: {stress(ACRYLIC_DESIGN_STRESS_MPA)} long-term design stress. {glass.panels.map((p) => `${p.panel[0].toUpperCase() + p.panel.slice(1)}: ${p.source}.`).join(" ")}
        </p>
        {!glass.ok && <Caution tone="danger">One or more panels don&apos;t pass: see the notes above before ordering glass.</Caution>}
        <ResultCautions cautions={glass.cautions ?? []} testId="glass-cautions" />
      </Block>

      {results.siteWarnings.length > 0 && (
        <Block title="Check before the build">
          <ul className="flex flex-col gap-2">
            {results.siteWarnings.map((w) => (
              <li key={w}>
                <Caution>{w}</Caution>
              </li>
            ))}
          </ul>
        </Block>
      )}

      {showCautions && <LoadCautions cautions={results.cautions} />}
    </>
  );
  // The sheet sets the blocks in two explicit columns: CSS multi-column breaks badly across printed pages.
  if (twoColumns) {
    return (
      <div className="grid gap-x-8 gap-y-5 text-sm md:grid-cols-2 print:grid-cols-2" data-testid="load-results">
        <div className="flex flex-col gap-5">{leftBlocks}</div>
        <div className="flex flex-col gap-5">{rightBlocks}</div>
      </div>
    );
  }
  return (
    <div className="flex flex-col gap-5 text-sm" data-testid="load-results">
      {leftBlocks}
      {rightBlocks}
    </div>
  );
}

/** The short cautions kept beside a glass or floor result. */
export function ResultCautions({ cautions, testId }: { cautions: readonly string[]; testId: string }) {
  return (
    <p className="text-xs text-caution" data-testid={testId}>
      {cautions.join(" ")}
    </p>
  );
}

export function LoadCautions({ cautions }: { cautions: readonly string[] }) {
  return (
    <Caution title="Before anyone relies on these figures">
      <ul className="list-disc pl-5" data-testid="load-cautions">
        {cautions.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </Caution>
  );
}
