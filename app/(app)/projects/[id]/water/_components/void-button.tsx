"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { sendJson } from "@/lib/http/send-json";
import { voidSchema } from "@/app/api/projects/[id]/water-tests/water-test.schema";
import { buttonStyles, inputStyles } from "@/components/ui/button-styles";

/** Asks for a reason, then voids the record. Nothing is deleted: the row stays, marked voided. */
export function VoidButton({ url, what, id }: { url: string; what: string; id: string }) {
  const router = useRouter();
  const [open, setOpen] = useState(false);
  const [reason, setReason] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  if (!open) {
    return (
      <button type="button" className={buttonStyles.quiet} onClick={() => setOpen(true)}>
        Void
      </button>
    );
  }
  const submit = async () => {
    const parsed = voidSchema.safeParse({ reason });
    if (!parsed.success) return setError(parsed.error.issues[0]?.message ?? "Say why.");
    setBusy(true);
    const result = await sendJson(url, "POST", parsed.data);
    setBusy(false);
    if (!result.ok) return setError(result.fields?.reason ?? result.error);
    setOpen(false);
    router.refresh();
  };
  const inputId = `void-${id}`;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={inputId} className="text-xs font-medium">
        Why void this {what}?
      </label>
      <input id={inputId} className={inputStyles} value={reason} onChange={(e) => setReason(e.target.value)} aria-invalid={!!error} />
      {error && <p className="text-xs text-danger">{error}</p>}
      <div className="flex gap-2">
        <button type="button" className={buttonStyles.danger} disabled={busy} onClick={submit}>
          {busy ? "Voiding…" : "Void"}
        </button>
        <button type="button" className={buttonStyles.secondary} onClick={() => setOpen(false)}>
          Cancel
        </button>
      </div>
    </div>
  );
}
