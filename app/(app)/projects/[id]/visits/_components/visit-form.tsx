"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { sendJson } from "@/lib/http/send-json";
import { Field } from "@/components/ui/field";
import { inputStyles } from "@/components/ui/button-styles";
import { visitKinds } from "@/db/schema/visits";
import { visitSchema, type VisitInput } from "@/app/api/projects/[id]/visits/visit.schema";
import { SubmitRow } from "@/components/ui/submit-row";

export type EditableVisit = { id: string; kind: VisitInput["kind"]; startsAt: string; durationMinutes: number; notes: string | null };

/** "2026-06-15T09:30" in the browser's time zone, for a datetime-local input. */
const localInput = (iso: string) => {
  const d = new Date(iso);
  return new Date(d.getTime() - d.getTimezoneOffset() * 60_000).toISOString().slice(0, 16);
};

/**
 * The lead books a visit, or changes one (`editing`); the time is entered in the browser's own time
 * zone. Booking or moving the install day moves the project's target install date with it.
 */
export function VisitForm({ projectId, editing, onDone }: { projectId: string; editing?: EditableVisit; onDone?: () => void }) {
  const router = useRouter();
  const [status, setStatus] = useState<{ ok: boolean; text: string } | null>(null);
  const { register, handleSubmit, formState, reset, setError } = useForm<VisitInput>({
    resolver: zodResolver(visitSchema),
    defaultValues: editing
      ? { kind: editing.kind, startsAt: localInput(editing.startsAt) as unknown as Date, durationMinutes: editing.durationMinutes, notes: editing.notes ?? "" }
      : { kind: "install day", durationMinutes: 120, notes: "" },
  });
  const pre = editing ? `visit-${editing.id}` : "visit";
  const onSubmit = handleSubmit(async (values) => {
    setStatus(null);
    const result = editing
      ? await sendJson(`/api/projects/${projectId}/visits/${editing.id}`, "PATCH", values)
      : await sendJson(`/api/projects/${projectId}/visits`, "POST", values);
    if (!result.ok) {
      for (const [f, message] of Object.entries(result.fields ?? {})) setError(f as keyof VisitInput, { message });
      setStatus({ ok: false, text: result.error });
      return;
    }
    const install = values.kind === "install day" ? " The project's target install date moved to that day." : "";
    if (!editing) reset();
    setStatus({ ok: true, text: `${editing ? "Visit changed." : "Visit booked. The client and crew see it on the project."}${install}` });
    router.refresh();
    onDone?.();
  });
  const e = formState.errors;
  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-3 rounded-2xl border border-line bg-card p-4 sm:grid-cols-2" aria-label={editing ? "Change this visit" : "Book a visit"}>
      <Field id={`${pre}-kind`} label="Visit" error={e.kind?.message}>
        <select id={`${pre}-kind`} className={inputStyles} {...register("kind")}>
          {visitKinds.map((k) => (
            <option key={k} value={k}>
              {k}
            </option>
          ))}
        </select>
      </Field>
      <Field id={`${pre}-starts`} label="Starts" error={e.startsAt?.message}>
        <input id={`${pre}-starts`} type="datetime-local" className={inputStyles} aria-invalid={!!e.startsAt} {...register("startsAt", { setValueAs: (v: string) => (v ? new Date(v).toISOString() : v) })} />
      </Field>
      <Field id={`${pre}-duration`} label="Length (minutes)" error={e.durationMinutes?.message}>
        <input id={`${pre}-duration`} type="number" min={15} step={15} className={inputStyles} aria-invalid={!!e.durationMinutes} {...register("durationMinutes")} />
      </Field>
      <Field id={`${pre}-notes`} label="Notes for the client and crew (optional)" error={e.notes?.message}>
        <input id={`${pre}-notes`} className={inputStyles} {...register("notes")} />
      </Field>
      <SubmitRow busy={formState.isSubmitting} label={editing ? "Save changes" : "Book visit"} busyLabel="Saving…" status={status} className="sm:col-span-2" />
    </form>
  );
}
