"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { sendJson } from "@/lib/http/send-json";
import { inputStyles } from "@/components/ui/button-styles";
import { SubmitRow, type FormStatus } from "@/components/ui/submit-row";
import { parseMajor } from "@/lib/money/amounts";
import { percentToBp, bpToPercent, minorToMajor } from "@/lib/money/inputs";

/** The project's payment schedule: deposit and install-day shares (the balance is the rest) and a monthly plan. */
export function ScheduleForm(props: { projectId: string; depositBp: number; progressBp: number; monthlyPlanMinor: number | null; monthlyPlanTaxBp: number; currency: string }) {
  const router = useRouter();
  const [deposit, setDeposit] = useState(bpToPercent(props.depositBp));
  const [progress, setProgress] = useState(bpToPercent(props.progressBp));
  const [plan, setPlan] = useState(props.monthlyPlanMinor ? minorToMajor(props.monthlyPlanMinor) : "");
  const [planTax, setPlanTax] = useState(bpToPercent(props.monthlyPlanTaxBp));
  const [status, setStatus] = useState<FormStatus>(null);
  const [busy, setBusy] = useState(false);
  return (
    <form
      className="flex flex-col gap-3"
      aria-label="Payment schedule"
      onSubmit={async (e) => {
        e.preventDefault();
        const body = { depositBp: percentToBp(deposit), progressBp: percentToBp(progress), monthlyPlanMinor: plan.trim() ? parseMajor(plan) : null, monthlyPlanTaxBp: percentToBp(planTax) };
        if (body.depositBp === null || body.progressBp === null || body.monthlyPlanTaxBp === null || (plan.trim() && body.monthlyPlanMinor === null)) {
          setStatus({ ok: false, text: "Enter shares as percentages (up to two decimals) and the plan as an amount such as 45.00." });
          return;
        }
        setBusy(true);
        const res = await sendJson(`/api/projects/${props.projectId}/schedule`, "PUT", body);
        setBusy(false);
        setStatus(res.ok ? { ok: true, text: "Schedule saved." } : { ok: false, text: res.fields ? Object.values(res.fields).join(" ") : res.error });
        if (res.ok) router.refresh();
      }}
    >
      <div className="grid gap-3 sm:grid-cols-4">
        <label className="flex flex-col gap-1 text-sm">
          Deposit on acceptance (%)
          <input className={inputStyles} inputMode="decimal" value={deposit} onChange={(e) => setDeposit(e.target.value)} />
        </label>
        <label className="flex flex-col gap-1 text-sm">
          On install day (%)
          <input className={inputStyles} inputMode="decimal" value={progress} onChange={(e) => setProgress(e.target.value)} />
        </label>
        <label className="flex flex-col gap-1 text-sm">
          Monthly plan ({props.currency}, tax included)
          <input className={inputStyles} inputMode="decimal" value={plan} placeholder="none" onChange={(e) => setPlan(e.target.value)} />
        </label>
        <label className="flex flex-col gap-1 text-sm">
          Plan tax rate (%)
          <input className={inputStyles} inputMode="decimal" value={planTax} onChange={(e) => setPlanTax(e.target.value)} />
        </label>
      </div>
      <p className="text-xs text-muted">The balance at handover is whatever the accepted total leaves after the deposit and the install-day payment.</p>
      <SubmitRow busy={busy} label="Save schedule" busyLabel="Saving…" status={status} variant="secondary" />
    </form>
  );
}
