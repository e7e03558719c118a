import { formatMoney, formatQuantity, formatRate } from "@/lib/money/amounts";
import { groupLines, type QuoteView } from "@/lib/money/quote-view";

/** A quote's lines in their groups, with each line's figures and the totals. Used on screen and in print. */
export function QuoteTable({ view }: { view: Pick<QuoteView, "lines" | "currency" | "netMinor" | "taxMinor" | "totalMinor"> }) {
  const money = (m: number) => formatMoney(m, view.currency);
  return (
    <table className="num w-full text-sm" data-testid="quote-table">
      <thead>
        <tr className="border-b border-line text-left text-xs text-muted">
          <th className="py-1 pr-2 font-medium">Item</th>
          <th className="py-1 pr-2 text-right font-medium">Qty</th>
          <th className="py-1 pr-2 text-right font-medium">Unit price</th>
          <th className="py-1 pr-2 text-right font-medium">Discount</th>
          <th className="py-1 pr-2 text-right font-medium">Tax</th>
          <th className="py-1 text-right font-medium">Line total</th>
        </tr>
      </thead>
      {groupLines(view.lines).map((g) => (
        <tbody key={g.group}>
          <tr>
            <th colSpan={6} className="pt-3 pb-1 text-left text-xs font-semibold uppercase tracking-wide text-muted">
              {g.label}
            </th>
          </tr>
          {g.lines.map((l, i) => (
            <tr key={i} className="border-b border-line/60 align-top">
              <td className="py-1 pr-2">{l.description}</td>
              <td className="py-1 pr-2 text-right whitespace-nowrap">
                {formatQuantity(l.quantityMilli)} {l.unit}
              </td>
              <td className="py-1 pr-2 text-right whitespace-nowrap">{money(l.unitPriceMinor)}</td>
              <td className="py-1 pr-2 text-right">{l.discountBp ? formatRate(l.discountBp) : "—"}</td>
              <td className="py-1 pr-2 text-right whitespace-nowrap">
                {formatRate(l.taxBp)} · {money(l.taxMinor)}
              </td>
              <td className="py-1 text-right whitespace-nowrap">{money(l.netMinor + l.taxMinor)}</td>
            </tr>
          ))}
        </tbody>
      ))}
      <tfoot>
        <tr>
          <td colSpan={5} className="pt-3 text-right">Before tax</td>
          <td className="pt-3 text-right whitespace-nowrap">{money(view.netMinor)}</td>
        </tr>
        <tr>
          <td colSpan={5} className="text-right">Tax</td>
          <td className="text-right whitespace-nowrap">{money(view.taxMinor)}</td>
        </tr>
        <tr className="font-semibold">
          <td colSpan={5} className="text-right">Total</td>
          <td className="text-right whitespace-nowrap" data-testid="quote-total">
            {money(view.totalMinor)}
          </td>
        </tr>
      </tfoot>
    </table>
  );
}

/** The rounding rule in words, printed under every quote and invoice. */
export const ROUNDING_NOTE = "Each line is rounded once to the smallest unit of the currency, halves away from zero, then its tax; totals are the sums of the lines.";
