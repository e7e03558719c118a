"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { sendJson } from "@/lib/http/send-json";
import { SubmitRow } from "@/components/ui/submit-row";
import { FLOOR_CODES, FLOOR_CODE_VALUES, type FloorCode } from "@/lib/tank/floor-codes";

/** The lead's choice of building code for floor screening, each with its figures and their sources. */
export function FloorCodeForm({ current }: { current: FloorCode }) {
  const router = useRouter();
  const [choice, setChoice] = useState<FloorCode>(current);
  const [busy, setBusy] = useState(false);
  const [status, setStatus] = useState<{ ok: boolean; text: string } | null>(null);

  async function onSubmit(e: React.FormEvent) {
    e.preventDefault();
    setBusy(true);
    setStatus(null);
    const res = await sendJson("/api/settings/floor-code", "PUT", { floorCode: choice });
    setBusy(false);
    if (!res.ok) {
      setStatus({ ok: false, text: res.fields?.floorCode ?? res.error });
      return;
    }
    setStatus({ ok: true, text: choice === current ? "Saved." : "Saved. Load checks approved under the other code now need approving again." });
    router.refresh();
  }

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="floor-code-heading" className="flex flex-col gap-4 rounded-2xl border border-line bg-card p-5">
      <div>
        <h2 id="floor-code-heading" className="text-lg font-semibold">
          Building code for floor screening
        </h2>
        <p className="text-sm text-muted">
          The floor loads the screening compares a tank with. Choose the code your installs are built under; local codes and licensed professionals still decide.
        </p>
      </div>
      <fieldset className="flex flex-col gap-3">
        <legend className="sr-only">Building code</legend>
        {FLOOR_CODES.map((code) => {
          const v = FLOOR_CODE_VALUES[code];
          return (
            <label key={code} className="grid cursor-pointer grid-cols-[auto_1fr] gap-x-3 gap-y-1 rounded-lg border border-line p-3 text-sm has-[:checked]:border-ink">
              <input type="radio" name="floorCode" value={code} checked={choice === code} onChange={() => setChoice(code)} className="row-span-3 mt-1" />
              <span className="font-semibold">{v.name}</span>
              <span>
                Living areas {v.liveLoadPrinted.living}, sleeping rooms {v.liveLoadPrinted.sleeping}
                {v.concentratedKN !== null && `, concentrated ${v.concentratedKN.toFixed(1)} kN`} <span className="text-muted">({v.liveLoadSource})</span>
              </span>
              <span>
                Ground under a slab: {v.lowestBearingPrinted} <span className="text-muted">({v.bearingSource})</span>
              </span>
            </label>
          );
        })}
      </fieldset>
      <SubmitRow busy={busy} label="Save building code" busyLabel="Saving…" status={status} />
    </form>
  );
}
