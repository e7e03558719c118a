"use client";
import { Fragment, useState } from "react";
import { format } from "date-fns";
import { toDisplay, unitLabel } from "@/lib/tank/units";
import { buttonStyles } from "@/components/ui/button-styles";
import { formatReading, type ReadingView } from "./views";
import { VoidButton } from "./void-button";
import { WaterTestForm } from "./water-test-form";
import { TakeBackButton } from "./take-back-button";

const roughly = (v: number) => String(Number(v.toPrecision(2)));

/** Every reading, newest first, in plain numbers; voided ones stay visible, struck through, with why. */
export function ReadingsTable({
  projectId,
  rows,
  unitSystem,
  canVoid,
  takeBack = {},
}: {
  projectId: string;
  rows: ReadingView[];
  unitSystem: "metric" | "imperial";
  canVoid: boolean;
  /** The viewer's own readings still inside the undo window, with the time the window ends ("10:42"). */
  takeBack?: Record<string, string>;
}) {
  const [fixing, setFixing] = useState<string | null>(null);
  const tempUnit = unitLabel("temperature", unitSystem);
  const actions = canVoid || Object.keys(takeBack).length > 0;
  const cols = actions ? 11 : 10;
  return (
    <section aria-labelledby="readings-heading" className="flex flex-col gap-3">
      <h2 id="readings-heading" className="text-lg font-semibold">
        Water tests
      </h2>
      {rows.length === 0 ? (
        <p className="rounded-xl border border-dashed border-line bg-card/60 px-4 py-6 text-center text-sm text-muted">
          No water tests yet — log the first one with the form above.
        </p>
      ) : (
        // On a phone the table scrolls sideways inside its box; keyboard users can focus the box to scroll it.
        // eslint-disable-next-line jsx-a11y/no-noninteractive-tabindex
        <div className="overflow-x-auto rounded-2xl border border-line bg-card" role="region" aria-labelledby="readings-heading" tabIndex={0}>
          <table className="w-full text-left text-sm" data-testid="readings-table">
            <thead className="border-b border-line text-xs uppercase tracking-wide text-muted">
              <tr>
                <th className="px-3 py-2">Taken</th>
                <th className="px-3 py-2">By</th>
                <th className="px-3 py-2 text-right">Ammonia mg/L</th>
                <th className="px-3 py-2 text-right">Nitrite mg/L</th>
                <th className="px-3 py-2 text-right">Nitrate mg/L</th>
                <th className="px-3 py-2 text-right">pH</th>
                <th className="px-3 py-2 text-right">Temp {tempUnit}</th>
                <th className="px-3 py-2 text-right">KH dKH</th>
                <th className="px-3 py-2 text-right" title="Un-ionized ammonia, from total ammonia, pH and temperature (Emerson et al. 1975)">
                  Free NH3 mg/L
                </th>
                <th className="px-3 py-2">Notes</th>
                {actions && <th className="px-3 py-2"><span className="sr-only">Actions</span></th>}
              </tr>
            </thead>
            <tbody>
              {rows.map((r) => (
                <Fragment key={r.id}>
                  <tr className={`border-b border-line last:border-0 ${r.voided ? "text-muted" : ""}`} data-testid="reading-row" data-voided={r.voided}>
                    <td className="whitespace-nowrap px-3 py-2">
                      <time dateTime={r.takenAt}>{format(new Date(r.takenAt), "d MMM yyyy, HH:mm")}</time>
                      {r.voided && <span className="ml-2 rounded bg-paper px-1.5 py-0.5 text-xs font-semibold">Voided</span>}
                      {r.corrects && <span className="ml-2 rounded bg-accent-soft px-1.5 py-0.5 text-xs font-semibold text-accent-strong">Correction</span>}
                    </td>
                    <td className="px-3 py-2">{r.takenByName}</td>
                    {[r.ammoniaMgL, r.nitriteMgL, r.nitrateMgL, r.pH].map((v, i) => (
                      <td key={i} className={`num px-3 py-2 text-right ${r.voided ? "line-through" : ""}`}>
                        {formatReading(v)}
                      </td>
                    ))}
                    <td className={`num px-3 py-2 text-right ${r.voided ? "line-through" : ""}`}>
                      {r.tempC == null ? "–" : toDisplay("temperature", r.tempC, unitSystem).toFixed(1)}
                    </td>
                    <td className="num px-3 py-2 text-right">{formatReading(r.khDkh)}</td>
                    <td className="num px-3 py-2 text-right">{r.freeAmmoniaMgL == null ? "–" : r.freeAmmoniaMgL === 0 ? "0" : `≈ ${roughly(r.freeAmmoniaMgL)}`}</td>
                    <td className="px-3 py-2">
                      {r.notes}
                      {r.voided && (
                        <span className="block text-xs">
                          Voided{r.voidedByName ? ` by ${r.voidedByName}` : ""}: {r.voidReason}
                        </span>
                      )}
                    </td>
                    {actions && (
                      <td className="px-3 py-2 align-top">
                        {!r.voided && !canVoid && takeBack[r.id] && (
                          <TakeBackButton url={`/api/projects/${projectId}/water-tests/${r.id}/take-back`} until={takeBack[r.id]} />
                        )}
                        {!r.voided && canVoid && (
                          <div className="flex flex-col items-start gap-1">
                            <button type="button" className={buttonStyles.quiet} onClick={() => setFixing(fixing === r.id ? null : r.id)} aria-expanded={fixing === r.id}>
                              Correct
                            </button>
                            <VoidButton url={`/api/projects/${projectId}/water-tests/${r.id}/void`} what="reading" id={r.id} />
                          </div>
                        )}
                      </td>
                    )}
                  </tr>
                  {fixing === r.id && (
                    <tr className="border-b border-line bg-paper">
                      <td colSpan={cols} className="px-3 py-3">
                        <WaterTestForm projectId={projectId} unitSystem={unitSystem} correcting={r} onDone={() => setFixing(null)} />
                      </td>
                    </tr>
                  )}
                </Fragment>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </section>
  );
}
