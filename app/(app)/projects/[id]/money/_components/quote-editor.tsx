"use client";
import { useMemo, useState } from "react";
import { useRouter } from "next/navigation";
import { sendJson } from "@/lib/http/send-json";
import { buttonStyles, inputStyles } from "@/components/ui/button-styles";
import type { FormStatus } from "@/components/ui/submit-row";
import { formatMoney, parseMajor, quoteTotals } from "@/lib/money/amounts";
import { bpToPercent, minorToMajor, percentToBp, quantityToMilli } from "@/lib/money/inputs";
import { QUOTE_GROUPS, QUOTE_GROUP_LABELS, type QuoteGroup } from "@/lib/money/quote-lines";
import type { QuoteLineInput } from "@/app/api/projects/[id]/quotes/quote.schema";

type Row = { group: QuoteGroup; description: string; unit: string; quantity: string; price: string; discount: string; tax: string; priceItemId: string | null };
export type EditorPriceItem = { id: string; group: QuoteGroup; label: string; unit: string; unitPriceMinor: number; taxBp: number };

const toRow = (l: QuoteLineInput): Row => ({
  group: l.group,
  description: l.description,
  unit: l.unit,
  quantity: String(l.quantityMilli / 1000),
  price: minorToMajor(l.unitPriceMinor),
  discount: bpToPercent(l.discountBp),
  tax: bpToPercent(l.taxBp),
  priceItemId: l.priceItemId,
});

/** Rows to the API's integers; the index of the first row that doesn't parse, or the lines. */
function toLines(rows: Row[]): { bad: number } | { lines: QuoteLineInput[] } {
  const lines: QuoteLineInput[] = [];
  for (const [i, r] of rows.entries()) {
    const quantityMilli = quantityToMilli(r.quantity);
    const unitPriceMinor = parseMajor(r.price);
    const discountBp = percentToBp(r.discount || "0");
    const taxBp = percentToBp(r.tax || "0");
    if (quantityMilli === null || unitPriceMinor === null || discountBp === null || taxBp === null) return { bad: i };
    lines.push({ group: r.group, description: r.description, unit: r.unit, quantityMilli, unitPriceMinor, discountBp, taxBp, priceItemId: r.priceItemId });
  }
  return { lines };
}

/** The lead edits a draft version: lines in groups, from the price list or by hand; totals are previewed here and worked out again on the server. */
export function QuoteEditor(props: { projectId: string; quoteId: string; version: number; currency: string; lines: QuoteLineInput[]; notes: string; priceItems: EditorPriceItem[]; defaultTaxBp: number }) {
  const router = useRouter();
  const [rows, setRows] = useState<Row[]>(props.lines.map(toRow));
  const [notes, setNotes] = useState(props.notes);
  const [pick, setPick] = useState("");
  const [status, setStatus] = useState<FormStatus>(null);
  const [busy, setBusy] = useState(false);
  const parsed = useMemo(() => toLines(rows), [rows]);
  const preview = useMemo(() => {
    if ("bad" in parsed) return null;
    try {
      return quoteTotals(parsed.lines);
    } catch {
      return null;
    }
  }, [parsed]);
  const set = (i: number, patch: Partial<Row>) => setRows((rs) => rs.map((r, j) => (j === i ? { ...r, ...patch } : r)));

  const save = async (): Promise<boolean> => {
    if ("bad" in parsed) {
      setStatus({ ok: false, text: `Line ${parsed.bad + 1}: enter the quantity, price, discount and tax as plain numbers (no minus sign).` });
      return false;
    }
    setBusy(true);
    const res = await sendJson(`/api/projects/${props.projectId}/quotes/${props.quoteId}`, "PUT", { lines: parsed.lines, notes });
    setBusy(false);
    if (!res.ok) {
      setStatus({ ok: false, text: res.fields ? `${res.error} ${Object.entries(res.fields).map(([k, v]) => `${k.replace(/^lines\.(\d+)\./, (_m, n) => `line ${Number(n) + 1}, `)}: ${v}`).join(" ")}` : res.error });
      return false;
    }
    setStatus({ ok: true, text: "Draft saved." });
    return true;
  };

  return (
    <div className="flex flex-col gap-3" data-testid="quote-editor">
      <h3 className="font-semibold">Draft: version {props.version}</h3>
      <div className="overflow-x-auto">
        <table className="num w-full min-w-[760px] text-sm">
          <thead>
            <tr className="text-left text-xs text-muted">
              <th className="font-medium">Group</th>
              <th className="font-medium">Description</th>
              <th className="font-medium">Qty</th>
              <th className="font-medium">Unit</th>
              <th className="font-medium">Unit price</th>
              <th className="font-medium">Disc. %</th>
              <th className="font-medium">Tax %</th>
              <th />
            </tr>
          </thead>
          <tbody>
            {rows.map((r, i) => (
              <tr key={i}>
                <td>
                  <select aria-label={`Line ${i + 1} group`} className={inputStyles} value={r.group} onChange={(e) => set(i, { group: e.target.value as QuoteGroup })}>
                    {QUOTE_GROUPS.map((g) => (
                      <option key={g} value={g}>
                        {QUOTE_GROUP_LABELS[g]}
                      </option>
                    ))}
                  </select>
                </td>
                <td>
                  <input aria-label={`Line ${i + 1} description`} className={inputStyles} value={r.description} onChange={(e) => set(i, { description: e.target.value })} />
                </td>
                <td className="w-24">
                  <input aria-label={`Line ${i + 1} quantity`} className={inputStyles} inputMode="decimal" value={r.quantity} onChange={(e) => set(i, { quantity: e.target.value })} />
                </td>
                <td className="w-20">
                  <input aria-label={`Line ${i + 1} unit`} className={inputStyles} value={r.unit} onChange={(e) => set(i, { unit: e.target.value })} />
                </td>
                <td className="w-28">
                  <input aria-label={`Line ${i + 1} unit price`} className={inputStyles} inputMode="decimal" value={r.price} onChange={(e) => set(i, { price: e.target.value })} />
                </td>
                <td className="w-20">
                  <input aria-label={`Line ${i + 1} discount`} className={inputStyles} inputMode="decimal" value={r.discount} onChange={(e) => set(i, { discount: e.target.value })} />
                </td>
                <td className="w-20">
                  <input aria-label={`Line ${i + 1} tax`} className={inputStyles} inputMode="decimal" value={r.tax} onChange={(e) => set(i, { tax: e.target.value })} />
                </td>
                <td>
                  <button type="button" className={buttonStyles.quiet} onClick={() => setRows((rs) => rs.filter((_, j) => j !== i))} aria-label={`Remove line ${i + 1}`}>
                    Remove
                  </button>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <div className="flex flex-wrap items-center gap-2">
        <select aria-label="Add from the price list" className={`${inputStyles} max-w-sm`} value={pick} onChange={(e) => setPick(e.target.value)}>
          <option value="">Add from the price list…</option>
          {props.priceItems.map((p) => (
            <option key={p.id} value={p.id}>
              {QUOTE_GROUP_LABELS[p.group]}: {p.label} ({formatMoney(p.unitPriceMinor, props.currency)} / {p.unit})
            </option>
          ))}
        </select>
        <button
          type="button"
          className={buttonStyles.secondary}
          onClick={() => {
            const p = props.priceItems.find((x) => x.id === pick);
            const row: Row = p
              ? { group: p.group, description: p.label, unit: p.unit, quantity: "1", price: minorToMajor(p.unitPriceMinor), discount: "0", tax: bpToPercent(p.taxBp), priceItemId: p.id }
              : { group: "labour", description: "", unit: "each", quantity: "1", price: "0.00", discount: "0", tax: bpToPercent(props.defaultTaxBp), priceItemId: null };
            setRows((rs) => [...rs, row]);
            setPick("");
          }}
        >
          {pick ? "Add item" : "Add a blank line"}
        </button>
      </div>
      <label className="flex flex-col gap-1 text-sm">
        Notes for the client
        <textarea rows={2} className={inputStyles} value={notes} onChange={(e) => setNotes(e.target.value)} />
      </label>
      <p className="num text-sm" data-testid="quote-preview">
        {preview
          ? `Before tax ${formatMoney(preview.netMinor, props.currency)} · tax ${formatMoney(preview.taxMinor, props.currency)} · total ${formatMoney(preview.totalMinor, props.currency)}`
          : "Totals appear when every line's figures are plain numbers within range."}
      </p>
      <div className="flex flex-wrap items-center gap-3">
        <button type="button" className={buttonStyles.secondary} disabled={busy} onClick={async () => (await save()) && router.refresh()}>
          Save draft
        </button>
        <button
          type="button"
          className={buttonStyles.primary}
          disabled={busy}
          onClick={async () => {
            if (!(await save())) return;
            setBusy(true);
            const res = await sendJson(`/api/projects/${props.projectId}/quotes/${props.quoteId}/issue`, "POST");
            setBusy(false);
            setStatus(res.ok ? { ok: true, text: "Issued: the client can read and accept it now." } : { ok: false, text: res.error });
            if (res.ok) router.refresh();
          }}
        >
          Issue to the client
        </button>
        {status && (
          <p role="status" className={`text-sm ${status.ok ? "text-ok" : "text-danger"}`}>
            {status.text}
          </p>
        )}
      </div>
    </div>
  );
}
