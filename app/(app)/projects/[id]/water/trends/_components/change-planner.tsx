"use client";
import { useState } from "react";
import { format } from "date-fns";
import { Field } from "@/components/ui/field";
import { inputStyles } from "@/components/ui/button-styles";
import {
  DEFAULT_NITRATE_LIMIT_MGL,
  litresToChange,
  longestIntervalDays,
  sawtoothPoints,
  smallestChangeFraction,
  steadyStateNitrate,
  wholeDaysWithin,
  wholePercentAtLeast,
} from "@/lib/service/water-change";
import { toDisplay, unitLabel, type UnitSystem } from "@/lib/tank/units";
import { SawtoothChart } from "./sawtooth-chart";

export type MeasuredRise = { risePerDayMgL: number; pairs: number; fromAt: string; toAt: string };

const num = (s: string) => (s.trim() === "" ? Number.NaN : Number(s.trim().replace(",", ".")));
const mgL = (n: number) => `${n < 10 ? n.toFixed(1) : Math.round(n)} mg/L`;

type Plan =
  | { ok: false; message: string }
  | { ok: true; before: number; after: number; maxDays: number | null; minPercent: number | null; litres: number | null; limit: number; points: ReturnType<typeof sawtoothPoints> };

function plan(rise: number, percent: number, days: number, tap: number, limit: number, netVolumeL: number | null): Plan {
  if (!Number.isFinite(limit) || limit <= 0) return { ok: false, message: "Enter the nitrate limit in mg/L, more than 0." };
  try {
    const routine = { risePerDayMgL: rise, changeFraction: percent / 100, intervalDays: days, tapNitrateMgL: tap };
    const settled = steadyStateNitrate(routine);
    const maxDays = longestIntervalDays({ risePerDayMgL: rise, changeFraction: percent / 100, tapNitrateMgL: tap, limitMgL: limit });
    const minFraction = smallestChangeFraction({ risePerDayMgL: rise, intervalDays: days, tapNitrateMgL: tap, limitMgL: limit });
    return {
      ok: true,
      before: settled.beforeChangeMgL,
      after: settled.afterChangeMgL,
      maxDays,
      minPercent: minFraction === null ? null : wholePercentAtLeast(minFraction),
      litres: netVolumeL ? litresToChange(percent, netVolumeL) : null,
      limit,
      points: sawtoothPoints(routine, 4),
    };
  } catch (error) {
    if (error instanceof RangeError) return { ok: false, message: error.message };
    throw error;
  }
}

/**
 * Where nitrate settles under a water-change routine, and what keeps it under a limit (the model and
 * its derivation are in lib/service/water-change.ts). It computes only; nothing is saved.
 */
export function ChangePlanner({ measuredRise, netVolumeL, unitSystem }: { measuredRise: MeasuredRise | null; netVolumeL: number | null; unitSystem: UnitSystem }) {
  const [rise, setRise] = useState(measuredRise ? String(Math.round(measuredRise.risePerDayMgL * 100) / 100) : "");
  const [percent, setPercent] = useState("25");
  const [days, setDays] = useState("7");
  const [tap, setTap] = useState("0");
  const [limit, setLimit] = useState(String(DEFAULT_NITRATE_LIMIT_MGL));

  const result = rise.trim() === "" ? null : plan(num(rise), num(percent), num(days), num(tap), num(limit), netVolumeL);
  const volUnit = unitLabel("volume", unitSystem);

  return (
    <section aria-labelledby="planner-heading" className="flex flex-col gap-4 rounded-2xl border border-line bg-card p-5">
      <div>
        <h2 id="planner-heading" className="text-lg font-semibold">
          Water-change planner
        </h2>
        <p className="text-sm text-muted">
          Nitrate builds up between water changes and each change takes a share of it out. With a steady routine the tank settles into the same rise and drop every time; this shows where, and what keeps it under a limit.
        </p>
      </div>
      <div className="grid gap-3 sm:grid-cols-5">
        <Field
          id="plan-rise"
          label="Nitrate rise (mg/L a day)"
          hint={
            measuredRise
              ? `Measured: the median rise between ${measuredRise.pairs} pairs of tests, ${format(new Date(measuredRise.fromAt), "d MMM")} to ${format(new Date(measuredRise.toAt), "d MMM")}.`
              : "Not enough tests to measure it yet: two rises between tests a day or more apart, in the last 90 days."
          }
        >
          <input id="plan-rise" inputMode="decimal" className={`${inputStyles} num`} value={rise} onChange={(e) => setRise(e.target.value)} />
        </Field>
        <Field id="plan-percent" label="Water changed (%)">
          <input id="plan-percent" inputMode="decimal" className={`${inputStyles} num`} value={percent} onChange={(e) => setPercent(e.target.value)} />
        </Field>
        <Field id="plan-days" label="Every (days)">
          <input id="plan-days" inputMode="decimal" className={`${inputStyles} num`} value={days} onChange={(e) => setDays(e.target.value)} />
        </Field>
        <Field id="plan-tap" label="Tap water nitrate (mg/L)" hint="Test the tap water, or ask the water supplier.">
          <input id="plan-tap" inputMode="decimal" className={`${inputStyles} num`} value={tap} onChange={(e) => setTap(e.target.value)} />
        </Field>
        <Field id="plan-limit" label="Keep nitrate under (mg/L)" hint={`${DEFAULT_NITRATE_LIMIT_MGL} mg/L is common practice for many freshwater fish; some need less.`}>
          <input id="plan-limit" inputMode="decimal" className={`${inputStyles} num`} value={limit} onChange={(e) => setLimit(e.target.value)} />
        </Field>
      </div>

      <div role="status" aria-live="polite" className="flex flex-col gap-2 text-sm" data-testid="planner-result">
        {result === null ? (
          <p className="text-muted">Enter how fast nitrate rises to see where the tank settles.</p>
        ) : !result.ok ? (
          <p className="text-danger">{result.message}</p>
        ) : (
          <>
            <p>
              Settles at about <strong className="num">{mgL(result.before)}</strong> just before each change and <strong className="num">{mgL(result.after)}</strong> just after it.
              {result.before > result.limit ? <span className="font-medium text-danger"> That is over the limit of {result.limit} mg/L before each change.</span> : <span> That stays under the limit of {result.limit} mg/L.</span>}
            </p>
            {result.litres !== null && (
              <p>
                Each change is <strong className="num">{Math.round(toDisplay("volume", result.litres, unitSystem))} {volUnit}</strong> of the tank&apos;s water.
              </p>
            )}
            <p>
              {result.maxDays === null ? (
                "The tap water alone is over the limit: no routine of changes with it can bring the tank under; treat or replace the top-up water."
              ) : result.maxDays === Number.POSITIVE_INFINITY ? (
                "With no rise, any interval keeps the tank under the limit."
              ) : wholeDaysWithin(result.maxDays) < 1 ? (
                <>Changing {num(percent)} % would have to happen more than once a day to stay under the limit.</>
              ) : (
                <>
                  Changing {num(percent)} %, stay under the limit by changing at least every <strong className="num">{wholeDaysWithin(result.maxDays)} days</strong>.
                </>
              )}{" "}
              {result.minPercent === null ? (
                result.maxDays === null ? null : <>Every {num(days)} days, even changing all the water would not be enough.</>
              ) : result.minPercent === 0 ? null : (
                <>
                  Every {num(days)} days, change at least <strong className="num">{result.minPercent} %</strong>.
                </>
              )}
            </p>
            <SawtoothChart points={result.points} limitMgL={result.limit} />
          </>
        )}
      </div>
      <p className="text-xs text-muted">
        The model assumes a steady rise and the same change each time; feeding, new fish, plants and filter care move the rise. Check it against tests every few visits. Mains water often carries chlorine or chloramine: treat it, and match its temperature, before it goes in.
      </p>
    </section>
  );
}
