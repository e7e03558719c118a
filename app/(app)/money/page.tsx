import type { Metadata } from "next";
import Link from "next/link";
import { requirePageUser } from "@/server/session";
import { getMoneyOverview, listOpenInvoices } from "@/db/queries/money-overview";
import { getMoneySettings } from "@/db/queries/money-settings";
import { formatMoney } from "@/lib/money/amounts";
import { INVOICE_KIND_LABELS, isOverdue, monthPeriod } from "@/lib/money/schedule";
import { STAGE_LABELS, type Stage } from "@/lib/stages/stages";
import { MonthlyBillingForm } from "./_components/monthly-billing-form";

export const metadata: Metadata = { title: "Money" };
export const dynamic = "force-dynamic";

/** The lead's view of money across every project: quoted, accepted, invoiced, paid and overdue. */
export default async function MoneyPage() {
  await requirePageUser("lead");
  const today = new Date().toISOString().slice(0, 10);
  const [rows, open, settings] = await Promise.all([getMoneyOverview(today), listOpenInvoices(), getMoneySettings()]);
  const money = (m: number) => formatMoney(m, settings.currency);
  const sum = (f: (r: (typeof rows)[number]) => number | null) => rows.reduce((s, r) => s + (f(r) ?? 0), 0);
  const totals = [
    { label: "Quoted (current versions)", value: sum((r) => r.quote_total), id: "quoted" },
    { label: "Accepted", value: sum((r) => r.accepted_total), id: "accepted" },
    { label: "Invoiced", value: sum((r) => r.invoiced), id: "invoiced" },
    { label: "Paid", value: sum((r) => r.paid), id: "paid" },
    { label: "Overdue", value: sum((r) => r.overdue), id: "overdue" },
  ];
  return (
    <div className="flex flex-col gap-5">
      <div className="flex flex-wrap items-center gap-3">
        <h1 className="text-2xl font-bold tracking-tight">Money</h1>
        <Link href="/money/prices" className="ml-auto text-sm font-semibold text-accent hover:underline">
          Price list and money settings
        </Link>
      </div>
      <dl className="grid gap-3 sm:grid-cols-5">
        {totals.map((t) => (
          <div key={t.id} className="rounded-xl border border-line bg-card p-3">
            <dt className="text-xs text-muted">{t.label}</dt>
            <dd className={`num text-lg font-semibold ${t.id === "overdue" && t.value > 0 ? "text-danger" : ""}`} data-testid={`total-${t.id}`}>
              {money(t.value)}
            </dd>
          </div>
        ))}
      </dl>
      <section className="overflow-x-auto rounded-2xl border border-line bg-card p-4">
        <h2 className="mb-2 font-semibold">By project</h2>
        <table className="num w-full min-w-[760px] text-sm">
          <thead>
            <tr className="text-left text-xs text-muted">
              <th className="font-medium">Project</th>
              <th className="font-medium">Stage</th>
              <th className="font-medium">Quote</th>
              <th className="text-right font-medium">Invoiced</th>
              <th className="text-right font-medium">Paid</th>
              <th className="text-right font-medium">Open</th>
              <th className="text-right font-medium">Overdue</th>
            </tr>
          </thead>
          <tbody>
            {rows.map((r) => (
              <tr key={r.id} className="border-t border-line/60">
                <td className="py-1">
                  <Link href={`/projects/${r.id}/money`} className="font-semibold hover:underline">
                    {r.title}
                  </Link>
                  <span className="block text-xs text-muted">{r.client_name}</span>
                </td>
                <td>{STAGE_LABELS[r.stage as Stage]}</td>
                <td>{r.quote_version ? `v${r.quote_version} · ${money(r.quote_total ?? 0)} · ${r.quote_accepted ? "accepted" : "awaiting acceptance"}` : "none yet"}</td>
                <td className="text-right">{money(r.invoiced)}</td>
                <td className="text-right">{money(r.paid)}</td>
                <td className="text-right">{money(r.open)}</td>
                <td className={`text-right ${r.overdue > 0 ? "text-danger" : ""}`}>{money(r.overdue)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </section>
      <section className="rounded-2xl border border-line bg-card p-4">
        <h2 className="mb-2 font-semibold">Unpaid invoices</h2>
        {open.length === 0 ? (
          <p className="text-sm text-muted">Everything invoiced is paid.</p>
        ) : (
          <ul className="flex flex-col divide-y divide-line text-sm">
            {open.map((i) => (
              <li key={i.id} className="flex flex-wrap gap-3 py-1">
                <Link href={`/print/invoice/${i.id}`} className="num font-semibold hover:underline">
                  No. {i.number}
                </Link>
                <span>
                  {INVOICE_KIND_LABELS[i.kind]}
                  {i.period ? ` ${i.period}` : ""} · {i.projectTitle} · {i.clientName}
                </span>
                <span className="num">{formatMoney(i.totalMinor, i.currency)}</span>
                <span className={isOverdue({ status: "open", dueOn: i.dueOn }, today) ? "text-danger" : "text-muted"}>
                  {isOverdue({ status: "open", dueOn: i.dueOn }, today) ? `overdue since ${i.dueOn}` : `due ${i.dueOn}`}
                </span>
              </li>
            ))}
          </ul>
        )}
      </section>
      <section className="rounded-2xl border border-line bg-card p-4">
        <h2 className="mb-2 font-semibold">Monthly care plans</h2>
        <MonthlyBillingForm defaultPeriod={monthPeriod(new Date())} />
      </section>
    </div>
  );
}
