"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { sendJson } from "@/lib/http/send-json";
import { inputStyles } from "@/components/ui/button-styles";
import { SubmitRow, type FormStatus } from "@/components/ui/submit-row";
import { bpToPercent, percentToBp } from "@/lib/money/inputs";

type Settings = { currency: string; depositBp: number; progressBp: number; defaultTaxBp: number; paymentTermsDays: number };

/** The company's one currency, its default schedule shares, default tax rate and payment terms. */
export function SettingsForm({ settings }: { settings: Settings }) {
  const router = useRouter();
  const [v, setV] = useState({ currency: settings.currency, deposit: bpToPercent(settings.depositBp), progress: bpToPercent(settings.progressBp), tax: bpToPercent(settings.defaultTaxBp), terms: String(settings.paymentTermsDays) });
  const [status, setStatus] = useState<FormStatus>(null);
  const [busy, setBusy] = useState(false);
  const field = (key: keyof typeof v, label: string) => (
    <label className="flex flex-col gap-1 text-sm">
      {label}
      <input className={inputStyles} value={v[key]} onChange={(e) => setV({ ...v, [key]: e.target.value })} />
    </label>
  );
  return (
    <form
      className="flex flex-col gap-3"
      onSubmit={async (e) => {
        e.preventDefault();
        const body = { currency: v.currency, depositBp: percentToBp(v.deposit), progressBp: percentToBp(v.progress), defaultTaxBp: percentToBp(v.tax), paymentTermsDays: Number(v.terms) };
        if (body.depositBp === null || body.progressBp === null || body.defaultTaxBp === null || !Number.isInteger(body.paymentTermsDays)) {
          setStatus({ ok: false, text: "Enter percentages as plain numbers (up to two decimals) and the terms in whole days." });
          return;
        }
        setBusy(true);
        const res = await sendJson("/api/money/settings", "PUT", body);
        setBusy(false);
        setStatus(res.ok ? { ok: true, text: "Settings saved." } : { ok: false, text: res.fields ? Object.values(res.fields).join(" ") : res.error });
        if (res.ok) router.refresh();
      }}
    >
      <div className="grid gap-3 sm:grid-cols-5">
        {field("currency", "Currency (3-letter code)")}
        {field("deposit", "Deposit on acceptance (%)")}
        {field("progress", "On install day (%)")}
        {field("tax", "Default tax rate (%)")}
        {field("terms", "Payment terms (days)")}
      </div>
      <SubmitRow busy={busy} label="Save settings" busyLabel="Saving…" status={status} variant="secondary" />
    </form>
  );
}
