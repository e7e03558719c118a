"use client";
import { useState } from "react";
import { format } from "date-fns";
import { sendJson } from "@/lib/http/send-json";
import { fillPlan, hoseFlowFromBucket } from "@/lib/tank/materials";
import { fromDisplay, toDisplay, unitLabel, type UnitSystem } from "@/lib/tank/units";
import { leakTestPassed, type LeakKind } from "@/lib/install/leak-rules";
import { Field } from "@/components/ui/field";
import { Caution } from "@/components/ui/caution";
import { buttonStyles, inputStyles } from "@/components/ui/button-styles";

type Check = { id: string; kind: LeakKind; passed: boolean; note: string | null; hoseFlowLPerMin: number | null; conditionerMl: number | null; at: string; byName: string };

const fmt = (v: number, digits = 1) => v.toLocaleString(undefined, { maximumFractionDigits: digits });
const num = (s: string) => (s.trim() === "" ? Number.NaN : Number(s.replace(",", ".")));

/** The fill: volume, time at the measured hose flow, conditioner for the volume, and the leak checks. */
export function FillPanel({ projectId, units, designVolumeL, initial }: { projectId: string; units: UnitSystem; designVolumeL: number | null; initial: Check[] }) {
  const vol = unitLabel("volume", units);
  const [checks, setChecks] = useState(initial);
  const [volumeIn, setVolume] = useState(designVolumeL ? String(Math.round(toDisplay("volume", designVolumeL, units))) : "");
  const [bucketIn, setBucket] = useState("");
  const [secondsIn, setSeconds] = useState("");
  const [flowIn, setFlow] = useState("");
  const [doseMl, setDoseMl] = useState("");
  const [dosePer, setDosePer] = useState("");
  const [note, setNote] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  const volumeL = fromDisplay("volume", num(volumeIn), units);
  const bucketL = fromDisplay("volume", num(bucketIn), units);
  const bucketFlow = bucketL > 0 && num(secondsIn) > 0 ? hoseFlowFromBucket(bucketL, num(secondsIn)) : null;
  const flowL = bucketFlow ?? fromDisplay("flow", num(flowIn), units);
  const perL = fromDisplay("volume", num(dosePer), units);
  const dose = num(doseMl) >= 0 && perL > 0 ? { ml: num(doseMl), perLitres: perL } : undefined;
  const plan = volumeL > 0 && flowL > 0 ? fillPlan({ netVolumeL: volumeL, hoseFlowLPerMin: flowL, conditionerDose: dose }) : null;

  async function record(kind: LeakKind, passed: boolean) {
    setBusy(true);
    setError(null);
    const body = kind === "filled" ? { kind, passed: true, note: note || null, hoseFlowLPerMin: flowL > 0 ? flowL : null, conditionerMl: plan?.conditionerMl ?? null } : { kind, passed, note: note || null };
    const res = await sendJson<{ check: Omit<Check, "byName"> }>(`/api/projects/${projectId}/leak-checks`, "POST", body);
    setBusy(false);
    if (!res.ok) return setError(res.fields ? Object.values(res.fields)[0] : res.error);
    setChecks((c) => [...c, { ...res.data.check, byName: "you" }]);
    setNote("");
  }

  const filled = checks.some((c) => c.kind === "filled");
  const passed = leakTestPassed(checks.map((c) => ({ ...c, at: new Date(c.at) })));
  return (
    <section aria-labelledby="fill-heading" className="flex flex-col gap-4 rounded-2xl border border-line bg-card p-4">
      <h2 id="fill-heading" className="text-lg font-semibold">
        Fill &amp; leak test
      </h2>
      <Caution title="During the fill">
        Heaters and pumps unplugged until the tank is full and dry outside. Drip loops on every cord; ground-fault protection tested
        before anything is plugged back in. Any wiring work is for a licensed electrician under local codes.
      </Caution>
      <Field id="fill-volume" label={`Water to add (${vol})`} hint={designVolumeL ? "From the tank design's net volume, including substrate and rock." : "No saved design: enter the net volume."}>
        <input id="fill-volume" inputMode="decimal" className={`${inputStyles} min-h-11`} value={volumeIn} onChange={(e) => setVolume(e.target.value)} />
      </Field>
      <fieldset className="grid grid-cols-2 gap-3">
        <legend className="mb-1 text-sm font-medium">Hose flow: time a bucket, or enter it</legend>
        <Field id="bucket-size" label={`Bucket size (${vol})`}>
          <input id="bucket-size" inputMode="decimal" className={`${inputStyles} min-h-11`} value={bucketIn} onChange={(e) => setBucket(e.target.value)} />
        </Field>
        <Field id="bucket-seconds" label="Seconds to fill it">
          <input id="bucket-seconds" inputMode="decimal" className={`${inputStyles} min-h-11`} value={secondsIn} onChange={(e) => setSeconds(e.target.value)} />
        </Field>
        <div className="col-span-2">
          <Field id="hose-flow" label={`Or hose flow (${unitLabel("flow", units)})`}>
            <input id="hose-flow" inputMode="decimal" className={`${inputStyles} min-h-11`} disabled={bucketFlow !== null} value={bucketFlow !== null ? fmt(toDisplay("flow", bucketFlow, units)) : flowIn} onChange={(e) => setFlow(e.target.value)} />
          </Field>
        </div>
      </fieldset>
      <fieldset className="grid grid-cols-2 gap-3">
        <legend className="mb-1 text-sm font-medium">Water conditioner, from the product&apos;s label</legend>
        <Field id="dose-ml" label="Dose (mL)">
          <input id="dose-ml" inputMode="decimal" className={`${inputStyles} min-h-11`} value={doseMl} onChange={(e) => setDoseMl(e.target.value)} />
        </Field>
        <Field id="dose-per" label={`treats (${vol})`}>
          <input id="dose-per" inputMode="decimal" className={`${inputStyles} min-h-11`} value={dosePer} onChange={(e) => setDosePer(e.target.value)} />
        </Field>
      </fieldset>
      {plan && (
        <p className="rounded-lg bg-paper p-3 text-sm tabular-nums" data-testid="fill-plan">
          About <strong>{fmt(plan.fillTimeMinutes, 0)} minutes</strong> to fill at {fmt(toDisplay("flow", flowL, units))} {unitLabel("flow", units)}
          {plan.conditionerMl !== null && (
            <>
              {" "}
              · conditioner <strong>{fmt(plan.conditionerMl, 0)} mL</strong>
            </>
          )}
        </p>
      )}
      <Field id="leak-note" label="Note (needed when a check fails: where, and what was done)">
        <input id="leak-note" className={`${inputStyles} min-h-11`} value={note} onChange={(e) => setNote(e.target.value)} />
      </Field>
      <div className="grid grid-cols-2 gap-2">
        <button type="button" disabled={busy} className={`${buttonStyles.primary} col-span-2 min-h-11`} onClick={() => void record("filled", true)}>
          {filled ? "Record a refill" : "Record the fill"}
        </button>
        <button type="button" disabled={busy || !filled} className={`${buttonStyles.secondary} min-h-11`} onClick={() => void record("at fill", true)}>
          At fill: dry
        </button>
        <button type="button" disabled={busy || !filled} className={`${buttonStyles.secondary} min-h-11 text-danger`} onClick={() => void record("at fill", false)}>
          At fill: leak
        </button>
        <button type="button" disabled={busy || !filled} className={`${buttonStyles.secondary} min-h-11`} onClick={() => void record("after 24 hours", true)}>
          After 24 h: dry
        </button>
        <button type="button" disabled={busy || !filled} className={`${buttonStyles.secondary} min-h-11 text-danger`} onClick={() => void record("after 24 hours", false)}>
          After 24 h: leak
        </button>
      </div>
      {error && (
        <p role="alert" className="text-sm font-medium text-danger">
          {error}
        </p>
      )}
      <p className={`text-sm font-semibold ${passed ? "text-ok" : "text-muted"}`}>{passed ? "Leak test passed: ready for cycling." : "The leak test passes with a fill and a dry check after 24 hours."}</p>
      <ol className="flex flex-col gap-1 text-sm" data-testid="leak-checks">
        {checks.map((c) => (
          <li key={c.id}>
            <span className="font-medium">{c.kind === "filled" ? "Filled" : `Check ${c.kind}`}</span>
            {c.kind !== "filled" && <span className={c.passed ? "text-ok" : "text-danger"}>{c.passed ? " · dry" : " · leak found"}</span>}
            {c.hoseFlowLPerMin !== null && ` · ${fmt(toDisplay("flow", c.hoseFlowLPerMin, units))} ${unitLabel("flow", units)}`}
            {c.conditionerMl !== null && ` · ${fmt(c.conditionerMl, 0)} mL conditioner`}
            <span className="text-muted">
              {" "}
              · {c.byName}, {format(new Date(c.at), "d MMM HH:mm")}
            </span>
            {c.note && <span className="block text-muted">“{c.note}”</span>}
          </li>
        ))}
      </ol>
    </section>
  );
}
