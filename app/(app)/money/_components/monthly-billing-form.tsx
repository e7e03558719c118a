"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { sendJson } from "@/lib/http/send-json";
import { inputStyles } from "@/components/ui/button-styles";
import { SubmitRow, type FormStatus } from "@/components/ui/submit-row";

/** Bills one month of every in-service project's plan; a month already billed is skipped. */
export function MonthlyBillingForm({ defaultPeriod }: { defaultPeriod: string }) {
  const router = useRouter();
  const [period, setPeriod] = useState(defaultPeriod);
  const [status, setStatus] = useState<FormStatus>(null);
  const [busy, setBusy] = useState(false);
  return (
    <form
      className="flex flex-wrap items-end gap-3"
      onSubmit={async (e) => {
        e.preventDefault();
        setBusy(true);
        const res = await sendJson<{ issued: number }>("/api/money/monthly", "POST", { period });
        setBusy(false);
        setStatus(res.ok ? { ok: true, text: res.data.issued ? `${res.data.issued} invoice(s) issued for ${period}.` : `Nothing new to bill for ${period}.` } : { ok: false, text: res.fields?.period ?? res.error });
        if (res.ok) router.refresh();
      }}
    >
      <label className="flex flex-col gap-1 text-sm">
        Month (YYYY-MM)
        <input className={inputStyles} value={period} onChange={(e) => setPeriod(e.target.value)} />
      </label>
      <SubmitRow busy={busy} label="Bill this month's plans" busyLabel="Billing…" status={status} variant="secondary" />
    </form>
  );
}
