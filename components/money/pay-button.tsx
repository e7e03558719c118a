"use client";
import { useState } from "react";
import { sendJson } from "@/lib/http/send-json";
import { buttonStyles } from "@/components/ui/button-styles";

/** Opens a card checkout for one invoice and goes to the payment service's page. */
export function PayButton({ invoiceId, label = "Pay by card" }: { invoiceId: string; label?: string }) {
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  return (
    <span className="inline-flex flex-wrap items-center gap-2">
      <button
        type="button"
        className={buttonStyles.primary}
        disabled={busy}
        onClick={async () => {
          setBusy(true);
          setError(null);
          const res = await sendJson<{ url: string }>(`/api/invoices/${invoiceId}/checkout`, "POST");
          if (res.ok) window.location.assign(res.data.url);
          else {
            setError(res.error);
            setBusy(false);
          }
        }}
      >
        {busy ? "Opening the payment page…" : label}
      </button>
      {error && (
        <span role="status" className="text-sm text-danger">
          {error}
        </span>
      )}
    </span>
  );
}
