import type { Metadata } from "next";
import Link from "next/link";
import { requirePageUser } from "@/server/session";
import { listInService } from "@/db/queries/in-service";
import { IN_SERVICE_PAGE_SIZE, inServiceQuerySchema } from "@/app/api/in-service/in-service.schema";
import { ATTENTION_WORDS } from "@/lib/stages/in-service-attention";
import { buttonStyles, inputStyles } from "@/components/ui/button-styles";

export const metadata: Metadata = { title: "Tanks in service" };

const dateWords = (iso: string) => new Date(iso).toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });

function pageHref(q: string | null, page: number) {
  const p = new URLSearchParams();
  if (q) p.set("q", q);
  if (page > 1) p.set("page", String(page));
  const s = p.toString();
  return `/board/in-service${s ? `?${s}` : ""}`;
}

/** Every tank in service the caller may see, a page at a time: the board shows only those that need attention. */
export default async function InServicePage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requirePageUser("lead", "crew");
  const raw = await searchParams;
  const parsed = inServiceQuerySchema.safeParse({ q: typeof raw.q === "string" ? raw.q : undefined, page: typeof raw.page === "string" ? raw.page : undefined });
  const query = parsed.success ? parsed.data : { q: null, page: 1 };
  const list = await listInService({ user, q: query.q, page: query.page, pageSize: IN_SERVICE_PAGE_SIZE });
  return (
    <div className="mx-auto flex max-w-4xl flex-col gap-4">
      <div className="flex flex-wrap items-baseline gap-3">
        <h1 className="text-2xl font-bold tracking-tight">Tanks in service</h1>
        <Link href="/board" className={buttonStyles.quiet}>
          Back to the board
        </Link>
      </div>
      <p className="text-sm text-muted">The board shows the tanks {ATTENTION_WORDS.recently_handed_over}; here is every tank in service{user.role === "crew" ? " you're assigned to" : ""}, newest handover first.</p>
      {!parsed.success && <p className="text-sm text-danger">{parsed.error.issues[0]?.message ?? "That search couldn't be read."} Showing the first page.</p>}
      <form role="search" aria-label="Search tanks in service" action="/board/in-service" className="flex flex-wrap items-end gap-2">
        <label className="flex flex-col gap-1 text-xs font-medium text-muted">
          Search title, client or town
          <input name="q" type="search" defaultValue={query.q ?? ""} maxLength={100} className={`${inputStyles} w-64`} data-testid="in-service-search" />
        </label>
        <button type="submit" className={buttonStyles.secondary}>
          Search
        </button>
      </form>
      <p className="text-sm" data-testid="in-service-total" aria-live="polite">
        {list.total === 0 ? (query.q ? "No tank in service matches that search." : "No tanks in service yet.") : `${list.total.toLocaleString("en")} tank${list.total === 1 ? "" : "s"} in service${query.q ? " match" : ""}; page ${list.page} of ${list.pageCount}.`}
      </p>
      {list.tanks.length > 0 && (
        <ul className="divide-y divide-line rounded-2xl border border-line bg-card" data-testid="in-service-list">
          {list.tanks.map((t) => (
            <li key={t.id} className="flex flex-wrap items-baseline gap-x-3 px-4 py-2 text-sm">
              <Link href={`/projects/${t.id}`} className="font-semibold text-accent hover:underline">
                {t.title}
              </Link>
              <span className="text-muted">
                {t.clientName} · {t.siteTown}
              </span>
              <span className="ml-auto text-xs text-muted">handed over {dateWords(t.handedOverAt)}</span>
            </li>
          ))}
        </ul>
      )}
      <nav aria-label="Pages" className="flex gap-3">
        {list.page > 1 && (
          <Link href={pageHref(query.q, list.page - 1)} className={buttonStyles.secondary} rel="prev">
            Newer
          </Link>
        )}
        {list.page < list.pageCount && (
          <Link href={pageHref(query.q, list.page + 1)} className={buttonStyles.secondary} rel="next">
            Older
          </Link>
        )}
      </nav>
    </div>
  );
}
