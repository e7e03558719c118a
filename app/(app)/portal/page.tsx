import type { Metadata } from "next";
import Link from "next/link";
import { requirePageUser } from "@/server/session";
import { listClientProjects } from "@/db/queries/client-home";
import { StageBadge } from "@/components/ui/stage-badge";
import { EmptyState } from "@/components/ui/empty-state";
import { NextStep } from "./_components/next-step";
import { listClientOpenInvoices } from "@/db/queries/money-overview";
import { PayButton } from "@/components/money/pay-button";
import { formatMoney } from "@/lib/money/amounts";
import { INVOICE_KIND_LABELS } from "@/lib/money/schedule";

export const metadata: Metadata = { title: "Your tanks" };
export const dynamic = "force-dynamic";

export default async function PortalPage() {
  const user = await requirePageUser("client");
  const [home, toPay] = await Promise.all([listClientProjects(user), listClientOpenInvoices(user.id)]);
  return (
    <div className="mx-auto flex max-w-3xl flex-col gap-4">
      <h1 className="text-2xl font-bold tracking-tight">Your aquarium projects</h1>
      {toPay.length > 0 && (
        <section className="flex flex-col gap-2 rounded-2xl border border-line bg-card p-5" aria-labelledby="to-pay" data-testid="portal-invoices">
          <h2 id="to-pay" className="text-lg font-semibold">
            Invoices to pay
          </h2>
          <ul className="flex flex-col divide-y divide-line">
            {toPay.map((i) => (
              <li key={i.id} className="flex flex-wrap items-center gap-3 py-2 text-sm">
                <Link href={`/projects/${i.projectId}/money`} className="num font-semibold hover:underline">
                  No. {i.number}
                </Link>
                <span>
                  {INVOICE_KIND_LABELS[i.kind]}
                  {i.period ? ` ${i.period}` : ""} · {i.projectTitle}
                </span>
                <span className="num">{formatMoney(i.totalMinor, i.currency)}</span>
                <span className="text-muted">due {i.dueOn}</span>
                <span className="ml-auto">
                  <PayButton invoiceId={i.id} />
                </span>
              </li>
            ))}
          </ul>
        </section>
      )}
      {home.length === 0 ? (
        <EmptyState title="No projects yet">Your installer will add your project here once it's booked.</EmptyState>
      ) : (
        <ul className="flex flex-col gap-3" aria-label="Your projects" data-testid="portal-projects">
          {home.map((p) => (
            <li key={p.id}>
              <article className="flex flex-col gap-2 rounded-2xl border border-line bg-card p-4" aria-labelledby={`project-${p.id}`}>
                <div className="flex flex-wrap items-center gap-2">
                  <h2 id={`project-${p.id}`} className="text-lg font-semibold">
                    <Link href={`/projects/${p.id}`} className="hover:underline">
                      {p.title}
                    </Link>
                  </h2>
                  <StageBadge stage={p.stage} />
                </div>
                <NextStep next={p.next} />
                {p.stage === "in_service" && (
                  <Link href={`/projects/${p.id}/service`} className="text-sm font-semibold text-accent hover:underline">
                    Service plan, next visits and visit reports
                  </Link>
                )}
              </article>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
