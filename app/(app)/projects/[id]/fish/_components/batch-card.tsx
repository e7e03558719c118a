"use client";
import { useState } from "react";
import { format } from "date-fns";
import { Field } from "@/components/ui/field";
import { Caution } from "@/components/ui/caution";
import { inputStyles } from "@/components/ui/button-styles";
import { SubmitRow } from "@/components/ui/submit-row";
import { addToDisplaySchema, quarantineNoteSchema, quarantineOverrideSchema, startQuarantineSchema } from "@/app/api/projects/[id]/stocking-plan/batches/[batchId]/quarantine.schema";
import { useAction } from "./use-action";

export type BatchCardView = {
  id: string;
  position: number;
  note: string | null;
  status: "planned" | "in quarantine" | "in display";
  items: { speciesId: string; commonName: string; scientificName: string; count: number }[];
  holdingTankName: string | null;
  quarantineStartedAt: string | null;
  quarantineEndsAt: string | null;
  quarantineDays: number | null;
  daysLeft: number | null;
  overrideReason: string | null;
  notes: { id: string; kind: "observation" | "treatment"; at: string; text: string; byName: string }[];
};

type Can = { quarantine: boolean; override: boolean; stock: boolean };
const day = (iso: string) => format(new Date(iso), "d MMM yyyy");

function StartQuarantine({ url, tanks }: { url: string; tanks: { id: string; name: string }[] }) {
  const [holdingTankId, setTank] = useState("");
  const a = useAction(startQuarantineSchema, url, "Quarantine started.");
  if (!tanks.length) return <p className="text-sm text-muted">No holding tanks yet: the lead adds them under Holding tanks.</p>;
  return (
    <form aria-label={`Start quarantine`} onSubmit={(e) => (e.preventDefault(), a.run({ holdingTankId }))} className="flex flex-wrap items-end gap-3">
      <Field id={`${url}-tank`} label="Holding tank" error={a.fields.holdingTankId ?? a.fields.startedAt}>
        <select id={`${url}-tank`} className={inputStyles} value={holdingTankId} onChange={(e) => setTank(e.target.value)}>
          <option value="">Choose…</option>
          {tanks.map((t) => (
            <option key={t.id} value={t.id}>
              {t.name}
            </option>
          ))}
        </select>
      </Field>
      <SubmitRow busy={a.busy} label="Start quarantine" busyLabel="Saving…" status={a.status} variant="secondary" />
    </form>
  );
}

function QuarantineNoteForm({ url }: { url: string }) {
  const [kind, setKind] = useState<"observation" | "treatment">("observation");
  const [text, setText] = useState("");
  const a = useAction(quarantineNoteSchema, url, "Noted.");
  return (
    <form aria-label="Add a quarantine note" onSubmit={async (e) => (e.preventDefault(), (await a.run({ kind, text })) && setText(""))} className="grid gap-2 sm:grid-cols-[10rem_1fr_auto] sm:items-end">
      <Field id={`${url}-kind`} label="Kind">
        <select id={`${url}-kind`} className={inputStyles} value={kind} onChange={(e) => setKind(e.target.value as typeof kind)}>
          <option value="observation">Observation</option>
          <option value="treatment">Treatment given</option>
        </select>
      </Field>
      <Field id={`${url}-text`} label="What was seen or given" error={a.fields.text ?? a.fields.at}>
        <input id={`${url}-text`} className={inputStyles} value={text} onChange={(e) => setText(e.target.value)} />
      </Field>
      <SubmitRow busy={a.busy} label="Add note" busyLabel="Saving…" status={a.status} variant="secondary" />
    </form>
  );
}

function OverrideForm({ url }: { url: string }) {
  const [reason, setReason] = useState("");
  const a = useAction(quarantineOverrideSchema, url, "Released early, with your reason.");
  return (
    <form aria-label="Release from quarantine early" onSubmit={(e) => (e.preventDefault(), a.run({ reason }))} className="flex flex-wrap items-end gap-3">
      <div className="min-w-64 flex-1">
        <Field id={`${url}-reason`} label="Release early: your reason (kept on the batch)" error={a.fields.reason}>
          <input id={`${url}-reason`} className={inputStyles} value={reason} onChange={(e) => setReason(e.target.value)} />
        </Field>
      </div>
      <SubmitRow busy={a.busy} label="Release early" busyLabel="Saving…" status={a.status} variant="secondary" />
    </form>
  );
}

function AddToDisplay({ url, isLead }: { url: string; isLead: boolean }) {
  const [reTestOverride, setReason] = useState("");
  const a = useAction(addToDisplaySchema, url, "The batch is in the display; the census now counts it. Test the water again before the next batch.");
  const reTestRefused = a.refusal?.status === 422 && !(a.fields.addedAt);
  return (
    <form aria-label="Add to the display" onSubmit={(e) => (e.preventDefault(), a.run({ reTestOverride }))} className="flex flex-col gap-2">
      {reTestRefused && isLead && (
        <Field id={`${url}-retest`} label="Add anyway past the water re-test: your reason" error={a.fields.reTestOverride}>
          <input id={`${url}-retest`} className={inputStyles} value={reTestOverride} onChange={(e) => setReason(e.target.value)} />
        </Field>
      )}
      <SubmitRow busy={a.busy} label="Add to the display" busyLabel="Saving…" status={a.status} />
    </form>
  );
}

/** One batch of the plan: its fish, and where it stands between plan, quarantine and display. */
export function BatchCard({ projectId, batch, tanks, can, isLead }: { projectId: string; batch: BatchCardView; tanks: { id: string; name: string }[]; can: Can; isLead: boolean }) {
  const base = `/api/projects/${projectId}/stocking-plan/batches/${batch.id}`;
  const total = batch.items.reduce((n, i) => n + i.count, 0);
  return (
    <li className="flex flex-col gap-3 rounded-xl border border-line p-4" data-testid={`batch-${batch.position}`}>
      <div className="flex flex-wrap items-baseline gap-x-3">
        <h3 className="font-semibold">Batch {batch.position}</h3>
        <span className="text-sm" data-testid="batch-status">
          {batch.status === "planned" ? "Planned" : batch.status === "in quarantine" ? "In quarantine" : "In the display"}
        </span>
        <span className="num text-sm text-muted">{total} fish</span>
      </div>
      <ul className="text-sm">
        {batch.items.map((i) => (
          <li key={i.speciesId}>
            <span className="num">{i.count}</span> × {i.commonName} <i className="text-muted">{i.scientificName}</i>
          </li>
        ))}
      </ul>
      {batch.note && <p className="text-sm text-muted">{batch.note}</p>}
      {batch.quarantineStartedAt && (
        <p className="text-sm">
          Quarantine in {batch.holdingTankName ?? "a holding tank"} from {day(batch.quarantineStartedAt)}
          {batch.quarantineEndsAt && ` to ${day(batch.quarantineEndsAt)} (${batch.quarantineDays} days)`}
          {batch.daysLeft != null && batch.status === "in quarantine" && <span data-testid="days-left">{batch.daysLeft > 0 ? ` · ${batch.daysLeft} days left` : " · period complete"}</span>}
        </p>
      )}
      {batch.overrideReason && <Caution>Released early by the lead: {batch.overrideReason}</Caution>}
      {batch.notes.length > 0 && (
        <ol className="flex flex-col gap-1 text-sm" aria-label="Quarantine log">
          {batch.notes.map((n) => (
            <li key={n.id}>
              <span className="text-muted">{format(new Date(n.at), "d MMM, HH:mm")} · {n.byName} · </span>
              {n.kind === "treatment" ? "Treatment: " : ""}
              {n.text}
            </li>
          ))}
        </ol>
      )}
      {batch.status === "planned" && can.quarantine && <StartQuarantine url={`${base}/quarantine`} tanks={tanks} />}
      {batch.status === "in quarantine" && (
        <>
          {can.quarantine && <QuarantineNoteForm url={`${base}/quarantine-notes`} />}
          {can.override && !batch.overrideReason && (batch.daysLeft ?? 0) > 0 && <OverrideForm url={`${base}/override`} />}
          {can.stock && <AddToDisplay url={`${base}/display`} isLead={isLead} />}
        </>
      )}
    </li>
  );
}
