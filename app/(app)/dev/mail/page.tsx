import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { requirePageUser } from "@/server/session";
import { env } from "@/env";
import { EmptyState } from "@/components/ui/empty-state";

export const metadata: Metadata = { title: "Caught mail" };
export const dynamic = "force-dynamic";

type CaughtMail = { id: number; to: string[]; subject: string; text: string; receivedAt: string };

/** Development only: the e-mails the local catcher received instead of real recipients. */
export default async function CaughtMailPage() {
  await requirePageUser("lead");
  const url = env().TANKWRIGHT_DEV_TOOLS ? env().MAIL_CATCHER_URL : undefined;
  if (!url) notFound();
  let mails: CaughtMail[] = [];
  let error: string | null = null;
  try {
    const res = await fetch(`${url}/api/messages`, { cache: "no-store" });
    mails = ((await res.json()) as CaughtMail[]).reverse();
  } catch {
    error = "The local mail catcher isn't answering. Restart with npm start.";
  }
  return (
    <div className="mx-auto flex max-w-4xl flex-col gap-4">
      <h1 className="text-2xl font-bold tracking-tight">Caught mail</h1>
      <p className="text-sm text-muted">In development, e-mail goes to a local catcher instead of real inboxes. This page shows what it received.</p>
      {error && <p className="text-danger">{error}</p>}
      {!error && mails.length === 0 && <EmptyState title="No mail caught yet" />}
      {mails.map((m) => (
        <details key={m.id} className="rounded-lg border border-line bg-card px-4 py-3 text-sm" data-testid="caught-mail">
          <summary className="cursor-pointer">
            <span className="font-medium">{m.subject}</span> <span className="text-muted">to {m.to.join(", ")} · {new Date(m.receivedAt).toLocaleString("en-GB")}</span>
          </summary>
          <pre className="mt-2 whitespace-pre-wrap font-mono text-xs">{m.text}</pre>
        </details>
      ))}
    </div>
  );
}
