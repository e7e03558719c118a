import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { requirePageUser } from "@/server/session";
import { requirePageProject } from "@/server/page-project";
import { getQuoteForPrint } from "@/db/queries/quotes";
import { QuoteTable, ROUNDING_NOTE } from "@/components/money/quote-table";
import { canOnProject } from "@/lib/auth/permissions";
import { PrintButton } from "@/components/ui/print-button";

export const metadata: Metadata = { title: "Quote" };
export const dynamic = "force-dynamic";

const UUID = /^[0-9a-f-]{36}$/i;

/** A quote version on one sheet for printing; the client sees only versions that were issued. */
export default async function PrintQuotePage({ params }: { params: Promise<{ quoteId: string }> }) {
  const { quoteId } = await params;
  const user = await requirePageUser("lead", "client");
  if (!UUID.test(quoteId)) notFound();
  const found = await getQuoteForPrint(quoteId);
  if (!found) notFound();
  const { project, relation } = await requirePageProject(found.quote.projectId, user, "see_money");
  if (!canOnProject(relation, "manage_money") && found.quote.status === "draft") notFound();
  const { view, quote, acceptance } = found;
  return (
    <article className="print-sheet mx-auto flex max-w-3xl flex-col gap-4 rounded-2xl border border-line bg-card p-8">
      <header className="flex flex-wrap items-start justify-between gap-4">
        <div>
          <p className="text-sm uppercase tracking-wide text-muted">{view.companyName}</p>
          <h1 className="text-2xl font-bold">
            Quote for {project.title}, version {view.version}
          </h1>
          <p className="text-sm text-muted">
            {project.siteAddress}
            {view.issuedAt ? ` · issued ${view.issuedAt.slice(0, 10)}` : " · draft, not issued"}
            {quote.status === "superseded" ? " · replaced by a later version" : ""}
          </p>
        </div>
        <PrintButton />
      </header>
      <QuoteTable view={view} />
      {view.notes && <p className="whitespace-pre-line text-sm">{view.notes}</p>}
      <p className="text-xs text-muted">{ROUNDING_NOTE} Prices in {view.currency}.</p>
      {acceptance && (
        <p className="text-sm">
          Accepted as “{acceptance.typedName}” on {acceptance.acceptedAt.toISOString().slice(0, 16).replace("T", " ")} UTC. Fingerprint of the accepted text: <code className="break-all text-xs">{acceptance.contentHash}</code>
        </p>
      )}
    </article>
  );
}
