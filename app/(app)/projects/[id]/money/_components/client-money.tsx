import Link from "next/link";
import { getCurrentQuote } from "@/db/queries/quotes";
import { listProjectInvoices } from "@/db/queries/invoices";
import { QuoteTable, ROUNDING_NOTE } from "@/components/money/quote-table";
import { InvoiceList } from "@/components/money/invoice-list";
import { PayButton } from "@/components/money/pay-button";
import { EmptyState } from "@/components/ui/empty-state";
import { AcceptForm } from "./accept-form";
import type { SessionUser } from "@/server/session";

const when = (d: Date) => d.toLocaleString("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "UTC" }) + " UTC";

/** The client's money page: the current quote to read and accept, and their invoices to pay. */
export async function ClientMoney({ projectId, user, today, payment }: { projectId: string; user: SessionUser; today: string; payment: string | null }) {
  const [current, invoices] = await Promise.all([getCurrentQuote(projectId), listProjectInvoices(projectId)]);
  const open = invoices.filter((i) => i.status === "open");
  return (
    <div className="flex flex-col gap-4">
      {payment === "returned" && (
        <p role="status" className="rounded-xl border border-line bg-card p-3 text-sm" data-testid="payment-returned">
          {open.length
            ? "Thank you. The payment service is confirming your payment; the invoice shows paid as soon as it has. This can take a minute; reload to check."
            : "Thank you: your payment is confirmed."}
        </p>
      )}
      {payment === "cancelled" && <p className="rounded-xl border border-line bg-card p-3 text-sm">The payment was cancelled; nothing was charged.</p>}
      <section className="flex flex-col gap-3 rounded-2xl border border-line bg-card p-5" aria-labelledby="quote-h">
        <h2 id="quote-h" className="text-lg font-semibold">
          Your quote{current ? `, version ${current.quote.version}` : ""}
        </h2>
        {!current ? (
          <EmptyState title="No quote yet">Your installer will put the quote here once the design is settled.</EmptyState>
        ) : (
          <>
            <QuoteTable view={current.view} />
            {current.view.notes && <p className="whitespace-pre-line text-sm">{current.view.notes}</p>}
            <p className="text-xs text-muted">{ROUNDING_NOTE}</p>
            <Link href={`/print/quote/${current.quote.id}`} className="text-sm font-semibold text-accent hover:underline">
              Printable quote
            </Link>
            {current.acceptance ? (
              <p className="text-sm text-ok" data-testid="quote-accepted">
                You accepted version {current.quote.version} on {when(current.acceptance.acceptedAt)}, as “{current.acceptance.typedName}”.
              </p>
            ) : (
              <AcceptForm projectId={projectId} quoteId={current.quote.id} hash={current.hash} version={current.quote.version} name={user.name} />
            )}
          </>
        )}
      </section>
      <section className="flex flex-col gap-3 rounded-2xl border border-line bg-card p-5" aria-labelledby="invoices-h">
        <h2 id="invoices-h" className="text-lg font-semibold">
          Your invoices
        </h2>
        <InvoiceList invoices={invoices} today={today} action={(inv) => (inv.status === "open" ? <PayButton invoiceId={inv.id} /> : null)} />
        <p className="text-xs text-muted">Card payments go through our payment service&apos;s own page; an invoice shows paid once the service confirms it to us.</p>
      </section>
    </div>
  );
}
