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

/** The lead books a visit; the time is entered in the browser's own time zone. */
export function VisitForm({ projectId }: { projectId: string }) {
  const router = useRouter();
  const [status, setStatus] = useState<{ ok: boolean; text: string } | null>(null);
  const { register, handleSubmit, formState, reset, setError } = useForm<VisitInput>({
    resolver: zodResolver(visitSchema),
    defaultValues: { kind: "install day", durationMinutes: 120, notes: "" },
  });
  const onSubmit = handleSubmit(async (values) => {
    setStatus(null);
    const result = await sendJson(`/api/projects/${projectId}/visits`, "POST", values);
    if (!result.ok) {
      for (const [f, message] of Object.entries(result.fields ?? {})) setError(f as keyof VisitInput, { message });
      setStatus({ ok: false, text: result.error });
      return;
    }
    reset();
    setStatus({ ok: true, text: "Visit booked. The client and crew see it on the project." });
    router.refresh();
  });
  const e = formState.errors;
  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-3 rounded-2xl border border-line bg-card p-4 sm:grid-cols-2" aria-label="Book a visit">
      <Field id="visit-kind" label="Visit" error={e.kind?.message}>
        <select id="visit-kind" className={inputStyles} {...register("kind")}>
          {visitKinds.map((k) => (
            <option key={k} value={k}>
              {k}
            </option>
          ))}
        </select>
      </Field>
      <Field id="visit-starts" label="Starts" error={e.startsAt?.message}>
        <input id="visit-starts" type="datetime-local" className={inputStyles} aria-invalid={!!e.startsAt} {...register("startsAt", { setValueAs: (v: string) => (v ? new Date(v).toISOString() : v) })} />
      </Field>
      <Field id="visit-duration" label="Length (minutes)" error={e.durationMinutes?.message}>
        <input id="visit-duration" type="number" min={15} step={15} className={inputStyles} aria-invalid={!!e.durationMinutes} {...register("durationMinutes")} />
      </Field>
      <Field id="visit-notes" label="Notes for the client and crew (optional)" error={e.notes?.message}>
        <input id="visit-notes" className={inputStyles} {...register("notes")} />
      </Field>
      <SubmitRow busy={formState.isSubmitting} label="Book visit" busyLabel="Booking…" status={status} className="sm:col-span-2" />
    </form>
  );
}
