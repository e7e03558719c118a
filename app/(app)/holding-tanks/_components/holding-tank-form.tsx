"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { holdingTankSchema, type HoldingTankInput } from "@/app/api/holding-tanks/holding-tank.schema";
import { sendJson } from "@/lib/http/send-json";
import { Field } from "@/components/ui/field";
import { inputStyles } from "@/components/ui/button-styles";
import { SubmitRow, type FormStatus } from "@/components/ui/submit-row";
import type { z } from "zod";

export function HoldingTankForm() {
  const router = useRouter();
  const [status, setStatus] = useState<FormStatus>(null);
  const { register, handleSubmit, formState, setError, reset } = useForm<HoldingTankInput, unknown, z.output<typeof holdingTankSchema>>({
    resolver: zodResolver(holdingTankSchema),
    defaultValues: { name: "", volumeL: "" as unknown as number, location: "" },
  });
  const onSubmit = handleSubmit(async (values) => {
    const result = await sendJson("/api/holding-tanks", "POST", values);
    if (!result.ok) {
      for (const [field, message] of Object.entries(result.fields ?? {})) setError(field as keyof HoldingTankInput, { message });
      setStatus({ ok: false, text: result.error });
      return;
    }
    reset();
    setStatus({ ok: true, text: "Holding tank added." });
    router.refresh();
  });
  const e = formState.errors;
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Add a holding tank" className="grid gap-3 rounded-2xl border border-line bg-card p-5 sm:grid-cols-3">
      <Field id="ht-name" label="Name" error={e.name?.message}>
        <input id="ht-name" className={inputStyles} {...register("name")} />
      </Field>
      <Field id="ht-volume" label="Volume (L)" error={e.volumeL?.message}>
        <input id="ht-volume" inputMode="decimal" className={`${inputStyles} num`} {...register("volumeL")} />
      </Field>
      <Field id="ht-location" label="Where it is" error={e.location?.message}>
        <input id="ht-location" className={inputStyles} {...register("location")} />
      </Field>
      <SubmitRow className="sm:col-span-3" busy={formState.isSubmitting} label="Add holding tank" busyLabel="Saving…" status={status} />
    </form>
  );
}
