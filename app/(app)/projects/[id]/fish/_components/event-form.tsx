"use client";
import { useState } from "react";
import { Field } from "@/components/ui/field";
import { inputStyles } from "@/components/ui/button-styles";
import { SubmitRow } from "@/components/ui/submit-row";
import { livestockEventSchema, MANUAL_EVENT_KINDS } from "@/app/api/projects/[id]/livestock/events/livestock-event.schema";
import { EVENT_LABELS } from "@/lib/stocking/census";
import { useAction } from "./use-action";
import type { GroupProps } from "./livestock-views";

type Kind = (typeof MANUAL_EVENT_KINDS)[number];

/**
 * Records what happened to a group. Moving fish out of the display is one step: choose the group,
 * "Moved to a holding tank", the tank and how many; the census follows.
 */
export function EventForm({ projectId, groups, tanks, initialGroupId }: { projectId: string; groups: GroupProps[]; tanks: { id: string; name: string }[]; initialGroupId?: string }) {
  const [v, setV] = useState({ groupId: initialGroupId ?? groups[0]?.id ?? "", kind: "measured" as Kind, count: "", place: "display", cause: "", holdingTankId: "", lengthCm: "", note: "" });
  const a = useAction(livestockEventSchema, `/api/projects/${projectId}/livestock/events`, "Recorded.");
  const set = (k: keyof typeof v) => (e: React.ChangeEvent<HTMLInputElement | HTMLSelectElement>) => setV({ ...v, [k]: e.target.value });
  const counted = ["lost", "to_holding", "from_holding", "rehomed"].includes(v.kind);
  async function submit(e: React.FormEvent) {
    e.preventDefault();
    const lengthMm = v.lengthCm.trim() === "" ? "" : String(Number(v.lengthCm.replace(",", ".")) * 10);
    const ok = await a.run({
      groupId: v.groupId,
      kind: v.kind,
      count: counted ? v.count : "",
      place: v.kind === "lost" || v.kind === "rehomed" ? v.place : "",
      cause: v.cause,
      holdingTankId: v.kind === "to_holding" || v.kind === "from_holding" ? v.holdingTankId : "",
      lengthMm: v.kind === "measured" ? lengthMm : "",
      note: v.note,
    });
    if (ok) setV({ ...v, count: "", cause: "", lengthCm: "", note: "" });
  }
  const f = a.fields;
  return (
    <form aria-label="Record what happened" onSubmit={submit} noValidate className="grid gap-3 sm:grid-cols-3">
      <Field id="ev-group" label="Group" error={f.groupId}>
        <select id="ev-group" className={inputStyles} value={v.groupId} onChange={set("groupId")}>
          {groups.map((g) => (
            <option key={g.id} value={g.id}>
              {g.commonName} ({g.census.display} in the display{g.census.holding ? `, ${g.census.holding} in holding` : ""})
            </option>
          ))}
        </select>
      </Field>
      <Field id="ev-kind" label="What happened" error={f.kind}>
        <select id="ev-kind" className={inputStyles} value={v.kind} onChange={set("kind")}>
          {MANUAL_EVENT_KINDS.map((k) => (
            <option key={k} value={k}>
              {EVENT_LABELS[k]}
            </option>
          ))}
        </select>
      </Field>
      {counted && (
        <Field id="ev-count" label="How many fish" error={f.count}>
          <input id="ev-count" inputMode="numeric" className={`${inputStyles} num`} value={v.count} onChange={set("count")} />
        </Field>
      )}
      {(v.kind === "lost" || v.kind === "rehomed") && (
        <Field id="ev-place" label="From" error={f.place}>
          <select id="ev-place" className={inputStyles} value={v.place} onChange={set("place")}>
            <option value="display">The display</option>
            <option value="holding">A holding tank</option>
          </select>
        </Field>
      )}
      {(v.kind === "to_holding" || v.kind === "from_holding") && (
        <Field id="ev-tank" label="Holding tank" error={f.holdingTankId}>
          <select id="ev-tank" className={inputStyles} value={v.holdingTankId} onChange={set("holdingTankId")}>
            <option value="">Choose…</option>
            {tanks.map((t) => (
              <option key={t.id} value={t.id}>
                {t.name}
              </option>
            ))}
          </select>
        </Field>
      )}
      {v.kind === "lost" && (
        <Field id="ev-cause" label="Cause" error={f.cause} hint="What it died of, or 'unknown'.">
          <input id="ev-cause" className={inputStyles} value={v.cause} onChange={set("cause")} />
        </Field>
      )}
      {v.kind === "measured" && (
        <Field id="ev-length" label="Length (cm)" error={f.lengthMm}>
          <input id="ev-length" inputMode="decimal" className={`${inputStyles} num`} value={v.lengthCm} onChange={set("lengthCm")} />
        </Field>
      )}
      <div className="sm:col-span-3">
        <Field id="ev-note" label={v.kind === "behaviour" ? "What you saw (who harassed whom, fin damage)" : "Note (optional)"} error={f.note ?? f.at}>
          <input id="ev-note" className={inputStyles} value={v.note} onChange={set("note")} />
        </Field>
      </div>
      <SubmitRow className="sm:col-span-3" busy={a.busy} label="Record" busyLabel="Saving…" status={a.status} />
    </form>
  );
}
