"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import type { z } from "zod";
import { sendJson } from "@/lib/http/send-json";
import { Field } from "@/components/ui/field";
import { inputStyles } from "@/components/ui/button-styles";
import { SubmitRow, type FormStatus } from "@/components/ui/submit-row";
import { EQUIPMENT_KINDS } from "@/lib/service/equipment-kinds";
import { newEquipmentSchema, type NewEquipmentInput } from "@/app/api/projects/[id]/equipment/equipment.schema";

export type EditablePiece = { id: string; kind: NewEquipmentInput["kind"]; makeModel: string | null; installedOn: string | null; warrantyUntil: string | null; serviceIntervalDays: number | null; notes: string | null };

/**
 * Adds a piece to the tank, or changes one (`editing`). An empty interval uses the company's
 * default for the kind (shown beside each kind); the last service is asked for only when adding.
 */
export function EquipmentForm({ projectId, kindIntervals, editing, onDone }: { projectId: string; kindIntervals: Record<string, number | null>; editing?: EditablePiece; onDone?: () => void }) {
  const router = useRouter();
  const [status, setStatus] = useState<FormStatus>(null);
  const { register, handleSubmit, formState, reset, setError, watch } = useForm<NewEquipmentInput, unknown, z.output<typeof newEquipmentSchema>>({
    resolver: zodResolver(newEquipmentSchema),
    defaultValues: editing
      ? { kind: editing.kind, makeModel: editing.makeModel ?? "", installedOn: editing.installedOn ?? "", warrantyUntil: editing.warrantyUntil ?? "", serviceIntervalDays: (editing.serviceIntervalDays ?? "") as unknown as number, notes: editing.notes ?? "" }
      : { kind: "canister filter", makeModel: "", installedOn: "", warrantyUntil: "", serviceIntervalDays: "" as unknown as number, lastServicedOn: "", notes: "" },
  });
  const pre = editing ? `piece-${editing.id}` : "piece";
  const kindDefault = kindIntervals[watch("kind") ?? "other"];
  const onSubmit = handleSubmit(async (values) => {
    setStatus(null);
    const { lastServicedOn, ...rest } = values;
    const result = editing ? await sendJson(`/api/projects/${projectId}/equipment/${editing.id}`, "PATCH", rest) : await sendJson(`/api/projects/${projectId}/equipment`, "POST", { ...rest, lastServicedOn });
    if (!result.ok) {
      for (const [f, message] of Object.entries(result.fields ?? {})) setError(f as keyof NewEquipmentInput, { message });
      setStatus({ ok: false, text: result.error });
      return;
    }
    if (!editing) reset();
    setStatus({ ok: true, text: editing ? "Saved." : "Added to the tank's equipment." });
    router.refresh();
    onDone?.();
  });
  const e = formState.errors;
  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-3 rounded-2xl border border-line bg-card p-4 sm:grid-cols-2" aria-label={editing ? "Change this piece" : "Add equipment"}>
      <Field id={`${pre}-kind`} label="Kind" error={e.kind?.message}>
        <select id={`${pre}-kind`} className={inputStyles} {...register("kind")}>
          {EQUIPMENT_KINDS.map((k) => (
            <option key={k} value={k}>
              {k}
            </option>
          ))}
        </select>
      </Field>
      <Field id={`${pre}-make`} label="Make and model (as on the label)" error={e.makeModel?.message}>
        <input id={`${pre}-make`} className={inputStyles} aria-invalid={!!e.makeModel} {...register("makeModel")} />
      </Field>
      <Field id={`${pre}-installed`} label="Installed on" error={e.installedOn?.message}>
        <input id={`${pre}-installed`} type="date" className={inputStyles} aria-invalid={!!e.installedOn} {...register("installedOn")} />
      </Field>
      <Field id={`${pre}-warranty`} label="Warranty until" error={e.warrantyUntil?.message}>
        <input id={`${pre}-warranty`} type="date" className={inputStyles} aria-invalid={!!e.warrantyUntil} {...register("warrantyUntil")} />
      </Field>
      <Field
        id={`${pre}-interval`}
        label="Service every (days)"
        error={e.serviceIntervalDays?.message}
        hint={kindDefault == null ? "Empty: no routine service for this kind." : `Empty: the company's ${kindDefault} days for this kind.`}
      >
        <input id={`${pre}-interval`} inputMode="numeric" className={`${inputStyles} num`} aria-invalid={!!e.serviceIntervalDays} {...register("serviceIntervalDays")} />
      </Field>
      {!editing && (
        <Field id={`${pre}-last`} label="Last serviced (if it was already running)" error={e.lastServicedOn?.message}>
          <input id={`${pre}-last`} type="date" className={inputStyles} aria-invalid={!!e.lastServicedOn} {...register("lastServicedOn")} />
        </Field>
      )}
      <div className="sm:col-span-2">
        <Field id={`${pre}-notes`} label="Notes for the team (the client doesn't see them)" error={e.notes?.message}>
          <input id={`${pre}-notes`} className={inputStyles} {...register("notes")} />
        </Field>
      </div>
      <SubmitRow busy={formState.isSubmitting} label={editing ? "Save changes" : "Add equipment"} busyLabel="Saving…" status={status} className="sm:col-span-2" />
    </form>
  );
}
