"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { sendJson } from "@/lib/http/send-json";
import { buttonStyles, inputStyles } from "@/components/ui/button-styles";

/** The lead records a bank transfer for the invoice's full amount. */
export function TransferForm({ invoiceId, amountMinor, today }: { invoiceId: string; amountMinor: number; today: string }) {
  const router = useRouter();
  const [open, setOpen] = useState(false);
  const [receivedOn, setReceivedOn] = useState(today);
  const [reference, setReference] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  if (!open)
    return (
      <button type="button" className={buttonStyles.secondary} onClick={() => setOpen(true)}>
        Record a transfer
      </button>
    );
  return (
    <form
      className="flex flex-wrap items-end gap-2"
      aria-label="Record a bank transfer"
      onSubmit={async (e) => {
        e.preventDefault();
        setBusy(true);
        setError(null);
        const res = await sendJson(`/api/invoices/${invoiceId}/transfer`, "POST", { amountMinor, receivedOn, reference });
        setBusy(false);
        if (!res.ok) setError(res.fields ? Object.values(res.fields).join(" ") || res.error : res.error);
        else router.refresh();
      }}
    >
      <label className="flex flex-col text-xs">
        Received on
        <input type="date" className={inputStyles} value={receivedOn} onChange={(e) => setReceivedOn(e.target.value)} />
      </label>
      <label className="flex flex-col text-xs">
        Bank reference
        <input className={inputStyles} value={reference} onChange={(e) => setReference(e.target.value)} />
      </label>
      <button type="submit" className={buttonStyles.primary} disabled={busy}>
        {busy ? "Saving…" : "Mark paid"}
      </button>
      {error && (
        <span role="status" className="text-sm text-danger">
          {error}
        </span>
      )}
    </form>
  );
}
