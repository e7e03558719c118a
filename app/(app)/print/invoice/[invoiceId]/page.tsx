import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { requirePageUser } from "@/server/session";
import { requirePageProject } from "@/server/page-project";
import { getInvoice, listInvoicePayments } from "@/db/queries/invoices";
import { getProjectPeople } from "@/db/queries/project-page";
import { companyName } from "@/db/queries/outbox";
import { db } from "@/db";
import { formatMoney } from "@/lib/money/amounts";
import { INVOICE_KIND_LABELS } from "@/lib/money/schedule";
import { PrintButton } from "@/components/ui/print-button";
import { ROUNDING_NOTE } from "@/components/money/quote-table";

export const metadata: Metadata = { title: "Invoice" };
export const dynamic = "force-dynamic";

const UUID = /^[0-9a-f-]{36}$/i;

/** One invoice on one sheet for printing: the lead, or the project's own client. */
export default async function PrintInvoicePage({ params }: { params: Promise<{ invoiceId: string }> }) {
  const { invoiceId } = await params;
  const user = await requirePageUser("lead", "client");
  if (!UUID.test(invoiceId)) notFound();
  const inv = await getInvoice(invoiceId);
  if (!inv) notFound();
  const { project } = await requirePageProject(inv.projectId, user, "see_money");
  const [people, company, payments] = await Promise.all([getProjectPeople(project), companyName(db()), listInvoicePayments([inv.id])]);
  const money = (m: number) => formatMoney(m, inv.currency);
  return (
    <article className="print-sheet mx-auto flex max-w-3xl flex-col gap-4 rounded-2xl border border-line bg-card p-8">
      <header className="flex flex-wrap items-start justify-between gap-4">
        <div>
          <p className="text-sm uppercase tracking-wide text-muted">{company}</p>
          <h1 className="text-2xl font-bold" data-testid="invoice-title">
            Invoice No. {inv.number}
          </h1>
          <p className="text-sm text-muted">
            Issued {inv.issuedAt.toISOString().slice(0, 10)} · due {inv.dueOn}
          </p>
        </div>
        <PrintButton />
      </header>
      <p className="text-sm">
        To {people.client?.name ?? "the client"}, {project.siteAddress}
        <br />
        For {project.title}
      </p>
      <table className="num w-full text-sm">
        <tbody>
          <tr className="border-b border-line">
            <td className="py-2">
              {INVOICE_KIND_LABELS[inv.kind]}
              {inv.period ? `, ${inv.period}` : ""}
            </td>
            <td className="py-2 text-right">{money(inv.netMinor)}</td>
          </tr>
          <tr>
            <td className="py-1 text-right">Tax</td>
            <td className="py-1 text-right">{money(inv.taxMinor)}</td>
          </tr>
          <tr className="font-semibold">
            <td className="py-1 text-right">Total</td>
            <td className="py-1 text-right">{money(inv.totalMinor)}</td>
          </tr>
        </tbody>
      </table>
      <p className="text-sm font-semibold" data-testid="invoice-paid-state">
        {inv.status === "paid" ? `Paid ${inv.paidAt?.toISOString().slice(0, 10) ?? ""}${payments[0] ? ` (${payments[0].method === "card" ? "card" : "bank transfer"})` : ""}` : `Unpaid: due ${inv.dueOn}`}
      </p>
      <p className="text-xs text-muted">{ROUNDING_NOTE}</p>
    </article>
  );
}
