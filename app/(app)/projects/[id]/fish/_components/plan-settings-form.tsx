"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { planSettingsSchema, type PlanSettingsInput, type PlanSettingsValues } from "@/app/api/projects/[id]/stocking-plan/plan.schema";
import { sendJson } from "@/lib/http/send-json";
import { Field } from "@/components/ui/field";
import { inputStyles } from "@/components/ui/button-styles";
import { SubmitRow, type FormStatus } from "@/components/ui/submit-row";

/** Whether the tank is a reef, and the pH the lead aims for (else the latest test's pH is used). */
export function PlanSettingsForm({ projectId, reef, targetPh, measuredPh }: { projectId: string; reef: boolean; targetPh: number | null; measuredPh: number | null }) {
  const router = useRouter();
  const [status, setStatus] = useState<FormStatus>(null);
  const { register, handleSubmit, formState, setError } = useForm<PlanSettingsInput, unknown, PlanSettingsValues>({
    resolver: zodResolver(planSettingsSchema),
    defaultValues: { reef: String(reef) as unknown as boolean, targetPh: (targetPh ?? "") as unknown as number },
  });
  const onSubmit = handleSubmit(async (values) => {
    const result = await sendJson(`/api/projects/${projectId}/stocking-plan`, "PUT", values);
    if (!result.ok) {
      for (const [field, message] of Object.entries(result.fields ?? {})) setError(field as keyof PlanSettingsInput, { message });
      setStatus({ ok: false, text: result.error });
      return;
    }
    setStatus({ ok: true, text: "Saved; the checks are updated." });
    router.refresh();
  });
  const e = formState.errors;
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Plan settings" className="grid gap-3 sm:grid-cols-3">
      <Field id="plan-reef" label="Corals or invertebrates in the tank" error={e.reef?.message}>
        <select id="plan-reef" className={inputStyles} {...register("reef")}>
          <option value="false">No</option>
          <option value="true">Yes, a reef</option>
        </select>
      </Field>
      <Field id="plan-ph" label="Target pH (optional)" error={e.targetPh?.message} hint={measuredPh != null ? `Empty uses the latest test: pH ${measuredPh.toFixed(1)}.` : "Empty uses the latest water test's pH."}>
        <input id="plan-ph" inputMode="decimal" className={`${inputStyles} num`} {...register("targetPh")} />
      </Field>
      <SubmitRow className="self-end" busy={formState.isSubmitting} label="Save" busyLabel="Saving…" status={status} variant="secondary" />
    </form>
  );
}
