"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import type { z } from "zod";
import { quarantineSettingSchema, type QuarantineSettingInput } from "@/app/api/settings/quarantine/quarantine.schema";
import { sendJson } from "@/lib/http/send-json";
import { Field } from "@/components/ui/field";
import { inputStyles } from "@/components/ui/button-styles";
import { SubmitRow, type FormStatus } from "@/components/ui/submit-row";

/** The company's quarantine period for new fish. */
export function QuarantineForm({ days, defaultDays }: { days: number; defaultDays: number }) {
  const router = useRouter();
  const [status, setStatus] = useState<FormStatus>(null);
  const { register, handleSubmit, formState, setError } = useForm<QuarantineSettingInput, unknown, z.output<typeof quarantineSettingSchema>>({
    resolver: zodResolver(quarantineSettingSchema),
    defaultValues: { quarantineDays: String(days) as unknown as number },
  });
  const onSubmit = handleSubmit(async (values) => {
    const result = await sendJson("/api/settings/quarantine", "PUT", values);
    if (!result.ok) {
      for (const [field, message] of Object.entries(result.fields ?? {})) setError(field as keyof QuarantineSettingInput, { message });
      setStatus({ ok: false, text: result.error });
      return;
    }
    setStatus({ ok: true, text: "Saved. Batches already in quarantine keep the period they started with." });
    router.refresh();
  });
  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="quarantine-heading" className="flex flex-col gap-4 rounded-2xl border border-line bg-card p-5">
      <div>
        <h2 id="quarantine-heading" className="text-lg font-semibold">
          Quarantine
        </h2>
        <p className="text-sm text-muted">
          How long a new batch of fish stays in a holding tank before it may go into a client's display. The default, {defaultDays} days, is common practice; the lead may release a batch earlier
          with a written reason.
        </p>
      </div>
      <Field id="quarantine-days" label="Quarantine period (days)" error={formState.errors.quarantineDays?.message}>
        <input id="quarantine-days" inputMode="numeric" className={`${inputStyles} num max-w-32`} {...register("quarantineDays")} />
      </Field>
      <SubmitRow busy={formState.isSubmitting} label="Save quarantine period" busyLabel="Saving…" status={status} />
    </form>
  );
}
