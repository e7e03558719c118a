"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { sendJson } from "@/lib/http/send-json";
import { buttonStyles, inputStyles } from "@/components/ui/button-styles";
import { bpToPercent, minorToMajor, percentToBp } from "@/lib/money/inputs";
import { parseMajor } from "@/lib/money/amounts";
import { PRICE_BASES, PRICE_BASIS_LABELS, QUOTE_GROUPS, QUOTE_GROUP_LABELS, type PriceBasis, type QuoteGroup } from "@/lib/money/quote-lines";

type Item = { id: string; group: QuoteGroup; label: string; unit: string; unitPriceMinor: number; taxBp: number; basis: PriceBasis; panelThicknessMm: number | null; retired: boolean };
type Draft = { group: QuoteGroup; label: string; unit: string; price: string; tax: string; basis: PriceBasis; thickness: string };

const toDraft = (i: Item): Draft => ({ group: i.group, label: i.label, unit: i.unit, price: minorToMajor(i.unitPriceMinor), tax: bpToPercent(i.taxBp), basis: i.basis, thickness: i.panelThicknessMm ? String(i.panelThicknessMm) : "" });

function toBody(d: Draft): { error: string } | Record<string, unknown> {
  const unitPriceMinor = parseMajor(d.price);
  const taxBp = percentToBp(d.tax);
  if (unitPriceMinor === null) return { error: "Enter the price as a plain amount such as 120.00 (no minus sign)." };
  if (taxBp === null) return { error: "Enter the tax rate as a percentage such as 20." };
  const panelThicknessMm = d.thickness.trim() ? Number(d.thickness) : null;
  return { group: d.group, label: d.label, unit: d.unit, unitPriceMinor, taxBp, basis: d.basis, panelThicknessMm };
}

function Row({ draft, onChange }: { draft: Draft; onChange: (d: Draft) => void }) {
  const set = (patch: Partial<Draft>) => onChange({ ...draft, ...patch });
  return (
    <>
      <select aria-label="Group" className={inputStyles} value={draft.group} onChange={(e) => set({ group: e.target.value as QuoteGroup })}>
        {QUOTE_GROUPS.map((g) => (
          <option key={g} value={g}>
            {QUOTE_GROUP_LABELS[g]}
          </option>
        ))}
      </select>
      <input aria-label="Item" className={inputStyles} value={draft.label} onChange={(e) => set({ label: e.target.value })} />
      <input aria-label="Unit" className={inputStyles} value={draft.unit} onChange={(e) => set({ unit: e.target.value })} />
      <input aria-label="Unit price" className={inputStyles} inputMode="decimal" value={draft.price} onChange={(e) => set({ price: e.target.value })} />
      <input aria-label="Tax %" className={inputStyles} inputMode="decimal" value={draft.tax} onChange={(e) => set({ tax: e.target.value })} />
      <select aria-label="Quantity from" className={inputStyles} value={draft.basis} onChange={(e) => set({ basis: e.target.value as PriceBasis })}>
        {PRICE_BASES.map((b) => (
          <option key={b} value={b}>
            {PRICE_BASIS_LABELS[b]}
          </option>
        ))}
      </select>
      <input aria-label="Panel thickness (mm), glass only" className={inputStyles} inputMode="numeric" placeholder="any" value={draft.thickness} onChange={(e) => set({ thickness: e.target.value })} />
    </>
  );
}

/** The lead's price list: change a price in place, retire or restore an item, add a new one. */
export function PriceListEditor({ items, currency, defaultTaxBp }: { items: Item[]; currency: string; defaultTaxBp: number }) {
  const router = useRouter();
  const [drafts, setDrafts] = useState<Record<string, Draft>>(Object.fromEntries(items.map((i) => [i.id, toDraft(i)])));
  const [fresh, setFresh] = useState<Draft>({ group: "labour", label: "", unit: "each", price: "", tax: bpToPercent(defaultTaxBp), basis: "manual", thickness: "" });
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const send = async (url: string, method: string, body: Record<string, unknown> | { error: string }) => {
    if ("error" in body) return setMessage({ ok: false, text: String(body.error) });
    const res = await sendJson(url, method, body);
    setMessage(res.ok ? { ok: true, text: "Saved." } : { ok: false, text: res.fields ? Object.values(res.fields).join(" ") : res.error });
    if (res.ok) router.refresh();
    return res.ok;
  };
  const grid = "grid items-center gap-2 sm:grid-cols-[10rem_1fr_5rem_7rem_5rem_12rem_6rem_auto]";
  return (
    <div className="flex flex-col gap-2 text-sm">
      <p className="text-xs text-muted">Prices in {currency}, before tax.</p>
      {items.map((i) => (
        <div key={i.id} className={`${grid} ${i.retired ? "opacity-60" : ""}`} data-testid="price-item">
          <Row draft={drafts[i.id] ?? toDraft(i)} onChange={(d) => setDrafts({ ...drafts, [i.id]: d })} />
          <span className="flex gap-2">
            <button type="button" className={buttonStyles.secondary} onClick={() => send(`/api/price-list/${i.id}`, "PATCH", toBody(drafts[i.id] ?? toDraft(i)))}>
              Save
            </button>
            <button type="button" className={buttonStyles.quiet} onClick={() => send(`/api/price-list/${i.id}`, "PATCH", { retired: !i.retired })}>
              {i.retired ? "Restore" : "Retire"}
            </button>
          </span>
        </div>
      ))}
      <div className={`${grid} border-t border-line pt-3`}>
        <Row draft={fresh} onChange={setFresh} />
        <button
          type="button"
          className={buttonStyles.primary}
          onClick={async () => {
            if (await send("/api/price-list", "POST", toBody(fresh))) setFresh({ ...fresh, label: "", price: "" });
          }}
        >
          Add
        </button>
      </div>
      {message && (
        <p role="status" className={message.ok ? "text-ok" : "text-danger"}>
          {message.text}
        </p>
      )}
    </div>
  );
}
