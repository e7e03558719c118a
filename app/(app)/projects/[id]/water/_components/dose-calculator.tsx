"use client";
import { useState } from "react";
import { doseAdvice } from "@/lib/cycling/dose";
import { fromDisplay, toDisplay, unitLabel } from "@/lib/tank/units";
import { Field } from "@/components/ui/field";
import { inputStyles, buttonStyles } from "@/components/ui/button-styles";
import { Caution } from "@/components/ui/caution";

export type DoseSuggestion = { targetMgL: number; amountMl: number; sourcePercent: number };

const num = (s: string) => (s.trim() === "" ? Number.NaN : Number(s.trim().replace(",", ".")));

/**
 * How much ammonia solution of a given strength raises the tank's water to the target (mass
 * balance; see lib/cycling/dose.ts). The volume starts from the tank design when there is one.
 */
export function DoseCalculator({ designVolume, unitSystem, onUse }: { designVolume: { netVolumeL: number; sumpVolumeL: number } | null; unitSystem: "metric" | "imperial"; onUse: (s: DoseSuggestion) => void }) {
  const volUnit = unitLabel("volume", unitSystem);
  const totalL = designVolume ? designVolume.netVolumeL + designVolume.sumpVolumeL : null;
  const [volume, setVolume] = useState(totalL ? String(Math.round(toDisplay("volume", totalL, unitSystem))) : "");
  const [target, setTarget] = useState("2");
  const [current, setCurrent] = useState("0");
  const [strength, setStrength] = useState("10");

  const litres = fromDisplay("volume", num(volume), unitSystem);
  const advice =
    volume.trim() === "" ? null : doseAdvice({ tankVolumeL: litres, targetMgL: num(target), currentMgL: current.trim() === "" ? 0 : num(current), sourcePercent: num(strength) });
  const plan = advice?.kind === "dose" ? advice.plan : null;
  const problem = advice?.kind === "fix" ? advice.message : null;

  return (
    <div className="flex flex-col gap-3" aria-labelledby="calc-heading">
      <h3 id="calc-heading" className="font-semibold">
        Dose calculator
      </h3>
      <div className="grid gap-3 sm:grid-cols-4">
        <Field
          id="calc-volume"
          label={`Water volume (${volUnit})`}
          hint={designVolume ? `From the tank design: water after rock and substrate${designVolume.sumpVolumeL ? ", plus the sump" : ""}.` : "No tank design yet: enter the water volume."}
        >
          <input id="calc-volume" inputMode="decimal" className={`${inputStyles} num`} value={volume} onChange={(e) => setVolume(e.target.value)} />
        </Field>
        <Field id="calc-target" label="Target ammonia (mg/L)" hint="About 2 mg/L is common practice.">
          <input id="calc-target" inputMode="decimal" className={`${inputStyles} num`} value={target} onChange={(e) => setTarget(e.target.value)} />
        </Field>
        <Field id="calc-current" label="Ammonia now (mg/L)">
          <input id="calc-current" inputMode="decimal" className={`${inputStyles} num`} value={current} onChange={(e) => setCurrent(e.target.value)} />
        </Field>
        <Field id="calc-strength" label="Solution strength (% NH3)" hint="From the bottle's label.">
          <input id="calc-strength" inputMode="decimal" className={`${inputStyles} num`} value={strength} onChange={(e) => setStrength(e.target.value)} />
        </Field>
      </div>
      <div role="status" aria-live="polite" className="text-sm" data-testid="dose-result">
        {problem ? (
          <p className="text-danger">{problem}</p>
        ) : advice?.kind === "none" ? (
          <p className="font-medium">{advice.message}</p>
        ) : plan ? (
          <p>
            Add <strong className="num">{plan.mL < 10 ? plan.mL.toFixed(1) : Math.round(plan.mL)} mL</strong>
            {plan.mL < 5 && <span className="num"> (about {Math.round(plan.drops)} drops)</span>} of the solution, spread over a few minutes near the outflow.
          </p>
        ) : (
          <p className="text-muted">Enter the water volume to see the dose.</p>
        )}
      </div>
      {plan && !problem && (
        <div>
          <button
            type="button"
            className={buttonStyles.secondary}
            onClick={() => onUse({ targetMgL: num(target), amountMl: Number(plan.mL.toFixed(1)), sourcePercent: num(strength) })}
          >
            Use these figures in the dose log
          </button>
        </div>
      )}
      <Caution title="Handling ammonia solution">
        Open and pour it in a well-ventilated room, wear gloves and eye protection, and keep it away from skin and eyes. Use plain ammonia with no
        surfactants, scent or colour (common practice: shake the bottle; lasting foam means it has additives). Never mix it with bleach.
      </Caution>
    </div>
  );
}
