import type { Metadata } from "next";
import { format, formatDistanceToNow } from "date-fns";
import { requirePageUser } from "@/server/session";
import { db } from "@/db";
import { listUndelivered } from "@/db/queries/outbox";
import { EmptyState } from "@/components/ui/empty-state";
import { RetryAllButton } from "./retry-all-button";

export const metadata: Metadata = { title: "Mail going out" };
export const dynamic = "force-dynamic";

export default async function OutboxPage() {
  await requirePageUser("lead");
  const rows = await listUndelivered(db());
  return (
    <div className="mx-auto flex max-w-4xl flex-col gap-4">
      <h1 className="text-2xl font-bold tracking-tight">Mail going out</h1>
      <p className="text-sm text-muted">
        E-mails wait here until the mail server accepts them. Nothing is lost while it is down: each is retried with growing pauses, and you can try again now.
      </p>
      {rows.length === 0 ? (
        <EmptyState title="Everything has been sent">No e-mail is waiting.</EmptyState>
      ) : (
        <>
          <RetryAllButton ids={rows.map((r) => r.id)} />
          <ul className="flex flex-col gap-2">
            {rows.map((r) => (
              <li key={r.id} className="rounded-lg border border-line bg-card px-4 py-3 text-sm" data-testid="outbox-row">
                <div className="flex flex-wrap items-center gap-2">
                  <span className={`rounded px-1.5 py-0.5 text-xs font-semibold ${r.status === "failed" ? "bg-danger-soft text-danger" : "bg-caution-soft text-caution"}`}>
                    {r.status === "failed" ? "Gave up" : "Waiting"}
                  </span>
                  {r.status === "waiting" && r.held && (
                    <span className="text-xs text-muted" data-testid="outbox-held-until">
                      {`held until ${format(r.sendAfter, "d MMM, HH:mm")}`}
                    </span>
                  )}
                  <span className="font-medium">{r.subject}</span>
                  <span className="ml-auto text-xs text-muted">{formatDistanceToNow(r.createdAt, { addSuffix: true })}</span>
                </div>
                <p className="text-muted">
                  To {r.recipientName ?? r.toEmail} ({r.toEmail}) · {r.attempts} attempt(s){r.lastError ? ` · last error: ${r.lastError}` : ""}
                </p>
              </li>
            ))}
          </ul>
        </>
      )}
    </div>
  );
}
