import Link from "next/link";
import { getCurrentQuote, listQuotes } from "@/db/queries/quotes";
import { listInvoicePayments, listProjectInvoices } from "@/db/queries/invoices";
import { getMoneySettings, getSchedule, listPriceItems } from "@/db/queries/money-settings";
import { QuoteTable, ROUNDING_NOTE } from "@/components/money/quote-table";
import { InvoiceList } from "@/components/money/invoice-list";
import { formatMoney } from "@/lib/money/amounts";
import { NewQuoteButtons } from "./new-quote-buttons";
import { QuoteEditor } from "./quote-editor";
import { ScheduleForm } from "./schedule-form";
import { TransferForm } from "./transfer-form";

const STATUS_WORDS = { draft: "draft", current: "current", superseded: "replaced" } as const;
const when = (d: Date) => d.toLocaleString("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "UTC" }) + " UTC";

/** The lead's money page for one project: versions, the draft, the schedule and the invoices. */
export async function LeadMoney({ projectId, today }: { projectId: string; today: string }) {
  const [versions, current, invoices, schedule, settings, items] = await Promise.all([
    listQuotes(projectId),
    getCurrentQuote(projectId),
    listProjectInvoices(projectId),
    getSchedule(projectId),
    getMoneySettings(),
    listPriceItems(),
  ]);
  const payments = await listInvoicePayments(invoices.map((i) => i.id));
  const draft = versions.find((v) => v.status === "draft");
  return (
    <div className="flex flex-col gap-4">
      <section className="flex flex-col gap-3 rounded-2xl border border-line bg-card p-5" aria-labelledby="quote-h">
        <h2 id="quote-h" className="text-lg font-semibold">
          Quote
        </h2>
        {versions.length > 0 && (
          <ul className="flex flex-col gap-1 text-sm" data-testid="quote-versions">
            {versions.map((v) => (
              <li key={v.id} className="flex flex-wrap gap-2">
                <span className="font-semibold">Version {v.version}</span>
                <span>{STATUS_WORDS[v.status]}</span>
                <span className="num">{formatMoney(v.totalMinor, v.currency)}</span>
                {v.acceptance && (
                  <span className="text-ok">
                    accepted by “{v.acceptance.typedName}” on {when(v.acceptance.acceptedAt)} from {v.acceptance.ipAddress ?? "an unknown address"} (fingerprint{" "}
                    <code className="text-xs">{v.acceptance.contentHash.slice(0, 12)}…</code>)
                  </span>
                )}
                {v.status !== "draft" && (
                  <Link href={`/print/quote/${v.id}`} className="font-semibold text-accent hover:underline">
                    Print
                  </Link>
                )}
              </li>
            ))}
          </ul>
        )}
        {draft ? (
          <QuoteEditor
            projectId={projectId}
            quoteId={draft.id}
            version={draft.version}
            currency={draft.currency}
            notes={draft.notes}
            lines={draft.lines.map((l) => ({ group: l.group, description: l.description, unit: l.unit, quantityMilli: l.quantityMilli, unitPriceMinor: l.unitPriceMinor, discountBp: l.discountBp, taxBp: l.taxBp, priceItemId: l.priceItemId }))}
            priceItems={items.map((p) => ({ id: p.id, group: p.group, label: p.label, unit: p.unit, unitPriceMinor: p.unitPriceMinor, taxBp: p.taxBp }))}
            defaultTaxBp={settings.defaultTaxBp}
          />
        ) : (
          <NewQuoteButtons projectId={projectId} hasCurrent={!!current} />
        )}
        {current && (
          <div className="flex flex-col gap-2 border-t border-line pt-3">
            <h3 className="font-semibold">What the client sees: version {current.quote.version}</h3>
            <QuoteTable view={current.view} />
            <p className="text-xs text-muted">{ROUNDING_NOTE}</p>
            <p className="text-sm">{current.acceptance ? `Accepted by ${current.acceptance.byName}.` : "Not accepted yet."}</p>
          </div>
        )}
      </section>
      <section className="flex flex-col gap-3 rounded-2xl border border-line bg-card p-5" aria-labelledby="schedule-h">
        <h2 id="schedule-h" className="text-lg font-semibold">
          Payment schedule
        </h2>
        <ScheduleForm
          projectId={projectId}
          depositBp={schedule.depositBp}
          progressBp={schedule.progressBp}
          monthlyPlanMinor={schedule.monthlyPlanMinor}
          monthlyPlanTaxBp={schedule.monthlyPlanTaxBp}
          currency={settings.currency}
        />
      </section>
      <section className="flex flex-col gap-3 rounded-2xl border border-line bg-card p-5" aria-labelledby="invoices-h">
        <h2 id="invoices-h" className="text-lg font-semibold">
          Invoices
        </h2>
        <InvoiceList invoices={invoices} today={today} action={(inv) => (inv.status === "open" ? <TransferForm invoiceId={inv.id} amountMinor={inv.totalMinor} today={today} /> : null)} />
        {payments.length > 0 && (
          <ul className="text-xs text-muted">
            {payments.map((p) => (
              <li key={p.id}>
                No. {invoices.find((i) => i.id === p.invoiceId)?.number}: {p.method === "card" ? "card" : `transfer recorded by ${p.recordedByName ?? "someone"}`}, {formatMoney(p.amountMinor, settings.currency)} on {p.receivedOn} (ref. {p.reference})
              </li>
            ))}
          </ul>
        )}
      </section>
    </div>
  );
}
