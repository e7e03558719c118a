import Link from "next/link";
import type { ReactNode } from "react";
import { formatMoney } from "@/lib/money/amounts";
import { INVOICE_KIND_LABELS, isOverdue, type InvoiceKind } from "@/lib/money/schedule";

export type InvoiceItem = { id: string; number: number; kind: InvoiceKind; period: string | null; totalMinor: number; currency: string; dueOn: string; status: "open" | "paid"; paidAt?: Date | null };

/** A project's invoices with their state; `action` adds a control per invoice (pay, record a transfer). */
export function InvoiceList({ invoices, today, action }: { invoices: InvoiceItem[]; today: string; action?: (inv: InvoiceItem) => ReactNode }) {
  if (!invoices.length) return <p className="text-sm text-muted">No invoices yet.</p>;
  return (
    <ul className="flex flex-col divide-y divide-line" data-testid="invoice-list">
      {invoices.map((inv) => {
        const overdue = isOverdue(inv, today);
        return (
          <li key={inv.id} className="flex flex-wrap items-center gap-3 py-2" data-testid={`invoice-${inv.kind}`}>
            <span className="num font-semibold">No. {inv.number}</span>
            <span>
              {INVOICE_KIND_LABELS[inv.kind]}
              {inv.period ? ` ${inv.period}` : ""}
            </span>
            <span className="num">{formatMoney(inv.totalMinor, inv.currency)}</span>
            <span className={`text-sm ${inv.status === "paid" ? "text-ok" : overdue ? "text-danger" : "text-muted"}`} data-testid="invoice-status">
              {inv.status === "paid" ? "Paid" : overdue ? `Overdue since ${inv.dueOn}` : `Due ${inv.dueOn}`}
            </span>
            <Link href={`/print/invoice/${inv.id}`} className="text-sm font-semibold text-accent hover:underline">
              Print
            </Link>
            {action && <span className="ml-auto">{action(inv)}</span>}
          </li>
        );
      })}
    </ul>
  );
}
