"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { timingSchema, type TimingInput, type TimingValues } from "@/app/api/settings/timing/timing.schema";
import { STAGE_LABELS } from "@/lib/stages/stages";
import { TIMED_STAGES, type StageDurations } from "@/lib/stages/durations";
import { sendJson } from "@/lib/http/send-json";
import { delayWords } from "@/lib/mail/notice-delay";
import { Field } from "@/components/ui/field";
import { inputStyles } from "@/components/ui/button-styles";
import { SubmitRow } from "@/components/ui/submit-row";

type TimedStage = (typeof TIMED_STAGES)[number];
const text = (v: unknown) => (v === undefined || v === null ? "" : String(v));

/**
 * The lead's editor for how long each stage is expected to take (a card is late only against its
 * own stage) and how long client e-mails wait in the outbox before they leave.
 */
export function TimingForm({
  overrides,
  defaults,
  noticeDelay,
}: {
  overrides: Partial<Record<string, unknown>>;
  defaults: StageDurations;
  noticeDelay: { companySeconds: number | null; defaultSeconds: number };
}) {
  const router = useRouter();
  const [status, setStatus] = useState<{ ok: boolean; text: string } | null>(null);
  const initial: TimingInput = {
    stageDurations: Object.fromEntries(TIMED_STAGES.map((s) => [s, text(overrides[s])])) as TimingInput["stageDurations"],
    noticeDelayMinutes: noticeDelay.companySeconds === null ? "" : String(noticeDelay.companySeconds / 60),
  };
  const { register, handleSubmit, formState } = useForm<TimingInput, unknown, TimingValues>({ resolver: zodResolver(timingSchema), defaultValues: initial });
  const onSubmit = handleSubmit(async (values) => {
    setStatus(null);
    const result = await sendJson("/api/settings/timing", "PUT", values);
    if (!result.ok) return setStatus({ ok: false, text: result.error });
    setStatus({ ok: true, text: "Saved. The board's late flags use the new durations now." });
    router.refresh();
  });
  const e = formState.errors;
  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="timing-heading" className="flex flex-col gap-4 rounded-2xl border border-line bg-card p-5" data-testid="timing-form">
      <div>
        <h2 id="timing-heading" className="text-lg font-semibold">
          Stage durations and e-mail hold
        </h2>
        <p className="text-sm text-muted">
          A card is late when it has been in its stage longer than that stage is expected to take. Leave a field empty to use the house default, which is common
          practice for a custom install rather than a rule; set your own from your jobs.
        </p>
      </div>
      <div className="grid gap-4 sm:grid-cols-2">
        {TIMED_STAGES.map((stage: TimedStage) => (
          <Field
            key={stage}
            id={`duration-${stage}`}
            label={`${STAGE_LABELS[stage]} (days)`}
            error={e.stageDurations?.[stage]?.message}
            hint={`Default: ${defaults[stage]} days (common practice).`}
          >
            <input
              id={`duration-${stage}`}
              inputMode="numeric"
              placeholder={String(defaults[stage])}
              className={`${inputStyles} num`}
              aria-invalid={!!e.stageDurations?.[stage]}
              {...register(`stageDurations.${stage}`)}
            />
          </Field>
        ))}
        <Field
          id="notice-delay"
          label="Hold client e-mails for (minutes)"
          error={e.noticeDelayMinutes?.message}
          hint={`Stage changes and shared notes wait this long in the outbox, so a slip taken back at once reaches nobody. Default: ${delayWords(noticeDelay.defaultSeconds)}.`}
        >
          <input
            id="notice-delay"
            inputMode="decimal"
            placeholder={String(noticeDelay.defaultSeconds / 60)}
            className={`${inputStyles} num`}
            aria-invalid={!!e.noticeDelayMinutes}
            {...register("noticeDelayMinutes")}
          />
        </Field>
      </div>
      <SubmitRow busy={formState.isSubmitting} label="Save durations" busyLabel="Saving…" status={status} />
    </form>
  );
}
