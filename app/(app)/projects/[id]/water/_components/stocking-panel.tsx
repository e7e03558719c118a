"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { format } from "date-fns";
import { stockingBatchSchema, type StockingBatchInput, type StockingBatchValues } from "@/app/api/projects/[id]/stocking-batches/stocking-batch.schema";
import { sendJson } from "@/lib/http/send-json";
import { Field } from "@/components/ui/field";
import { Caution } from "@/components/ui/caution";
import { buttonStyles, inputStyles } from "@/components/ui/button-styles";
import { formatReading, type BatchView } from "./views";

const fresh = (): StockingBatchInput => ({ description: "", fishCount: "", quarantineDays: "", overrideReason: "" });
const when = (iso: string) => format(new Date(iso), "d MMM, HH:mm");

function ReTestStatus({ reTest }: { reTest: BatchView["reTest"] }) {
  if (reTest.status === "zero") return <span className="text-ok">✓ Re-tested at zero ({when(reTest.at!)})</span>;
  if (reTest.status === "waiting") return <span className="text-caution">Waiting for a re-test</span>;
  const shown = [
    reTest.ammoniaMgL ? `ammonia ${formatReading(reTest.ammoniaMgL)} mg/L` : "",
    reTest.nitriteMgL ? `nitrite ${formatReading(reTest.nitriteMgL)} mg/L` : "",
  ].filter(Boolean);
  return <span className="text-danger">! Re-test shows {shown.join(" and ")} ({when(reTest.at!)})</span>;
}

/** Fish batches during first stocking: each needs the water back at zero before the next. */
export function StockingPanel({ projectId, batches, canRecord, isLead }: { projectId: string; batches: BatchView[]; canRecord: boolean; isLead: boolean }) {
  const router = useRouter();
  const [refusal, setRefusal] = useState<{ text: string; canOverride: boolean } | null>(null);
  const [saved, setSaved] = useState<string | null>(null);
  const { register, handleSubmit, formState, reset, setError } = useForm<StockingBatchInput, unknown, StockingBatchValues>({ resolver: zodResolver(stockingBatchSchema), defaultValues: fresh() });
  const onSubmit = handleSubmit(async (values) => {
    setSaved(null);
    const result = await sendJson<{ overridden: boolean }>(`/api/projects/${projectId}/stocking-batches`, "POST", values);
    if (!result.ok) {
      for (const [field, message] of Object.entries(result.fields ?? {})) setError(field as keyof StockingBatchInput, { message });
      setRefusal({ text: result.error, canOverride: result.status === 422 && isLead });
      return;
    }
    setRefusal(null);
    reset(fresh());
    setSaved(result.data.overridden ? "Batch recorded past the rule, with your reason." : "Batch recorded. Test the water again before the next batch.");
    router.refresh();
  });
  const e = formState.errors;
  return (
    <section aria-labelledby="stocking-heading" className="flex flex-col gap-4 rounded-2xl border border-line bg-card p-5">
      <h2 id="stocking-heading" className="text-lg font-semibold">
        Fish batches
      </h2>
      {batches.length === 0 ? (
        <p className="text-sm text-muted">No fish added yet. The first batch can go in once the cycle gate is open.</p>
      ) : (
        <ol className="flex flex-col gap-2 text-sm" data-testid="stocking-batches">
          {batches.map((b, i) => (
            <li key={b.id} className="rounded-lg border border-line px-3 py-2">
              <div className="flex flex-wrap gap-x-3">
                <span className="font-semibold">Batch {i + 1}</span>
                <span className="num">{b.fishCount} fish</span>
                <span>{b.description}</span>
                <span className="text-muted">
                  {when(b.addedAt)} · {b.byName}
                  {b.quarantineDays != null && ` · ${b.quarantineDays} days' quarantine`}
                </span>
              </div>
              <ReTestStatus reTest={b.reTest} />
              {b.overrideReason && <p className="text-xs text-caution">Added past the re-test rule by the lead: {b.overrideReason}</p>}
            </li>
          ))}
        </ol>
      )}
      {canRecord && (
        <form onSubmit={onSubmit} noValidate aria-label="Record a fish batch" className="grid gap-3 sm:grid-cols-3">
          <div className="sm:col-span-3">
            <Field id="batch-description" label="Which fish" error={e.description?.message}>
              <input id="batch-description" className={inputStyles} aria-invalid={!!e.description} {...register("description")} />
            </Field>
          </div>
          <Field id="batch-count" label="Number of fish" error={e.fishCount?.message}>
            <input id="batch-count" inputMode="numeric" className={`${inputStyles} num`} aria-invalid={!!e.fishCount} {...register("fishCount")} />
          </Field>
          <Field id="batch-quarantine" label="Days already in quarantine" error={e.quarantineDays?.message}>
            <input id="batch-quarantine" inputMode="numeric" className={`${inputStyles} num`} aria-invalid={!!e.quarantineDays} {...register("quarantineDays")} />
          </Field>
          {refusal?.canOverride && (
            <div className="sm:col-span-3">
              <Field id="batch-override" label="Add anyway: your reason (kept on the batch)" error={e.overrideReason?.message}>
                <input id="batch-override" className={inputStyles} {...register("overrideReason")} />
              </Field>
            </div>
          )}
          <div className="flex flex-wrap items-center gap-3 sm:col-span-3">
            <button type="submit" className={buttonStyles.primary} disabled={formState.isSubmitting}>
              {formState.isSubmitting ? "Saving…" : "Record batch"}
            </button>
            {saved && (
              <p role="status" className="text-sm text-ok">
                {saved}
              </p>
            )}
          </div>
          {refusal && (
            <div className="sm:col-span-3">
              <Caution tone="danger">{refusal.text}</Caution>
            </div>
          )}
        </form>
      )}
    </section>
  );
}
