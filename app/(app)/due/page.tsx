import type { Metadata } from "next";
import Link from "next/link";
import { requirePageUser } from "@/server/session";
import { duePeople, loadDueItems } from "@/db/queries/due-list";
import { dueWeek, groupDueItems, weekWords } from "@/lib/service/due-list";
import { dateWords, localDay } from "@/lib/service/local-dates";
import { getServiceSettings } from "@/db/queries/service-settings";
import { EmptyState } from "@/components/ui/empty-state";
import { DueItemLine } from "./_components/due-item-line";

export const metadata: Metadata = { title: "Due" };
export const dynamic = "force-dynamic";

const MAX_WEEKS = 104;

/** A week offset from the address: a whole number of weeks, two years either way, else this week. */
function weekOffset(raw: string | string[] | undefined): number {
  const n = typeof raw === "string" && /^-?\d{1,3}$/.test(raw) ? Number(raw) : 0;
  return Math.max(-MAX_WEEKS, Math.min(MAX_WEEKS, n));
}

/**
 * What is due across every tank the person may see: overdue on top, then the week by day. Crew
 * start on their own week; the lead starts on everyone's. Clients have no due list.
 */
export default async function DuePage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requirePageUser("lead", "crew");
  const sp = await searchParams;
  const { timeZone } = await getServiceSettings();
  const week = dueWeek(localDay(new Date(), timeZone), weekOffset(sp.week));
  const people = await duePeople(user);
  const askedFor = typeof sp.person === "string" ? sp.person : user.role === "crew" ? user.id : "all";
  const personId = askedFor !== "all" && people.some((p) => p.id === askedFor) ? askedFor : askedFor === "all" ? null : user.role === "crew" ? user.id : null;
  const { items, today } = await loadDueItems({ user, week });
  const groups = groupDueItems(items, { today, week, personId });
  const personName = personId ? (personId === user.id ? "you" : people.find((p) => p.id === personId)?.name) : null;
  const href = (over: { week?: number; person?: string | null }) => {
    const q = new URLSearchParams();
    const w = over.week ?? week.offset;
    if (w) q.set("week", String(w));
    const p = over.person === undefined ? (personId ?? "all") : (over.person ?? "all");
    q.set("person", p);
    return `/due?${q}`;
  };
  const chip = (active: boolean) => `rounded-full border px-3 py-1 text-sm ${active ? "border-accent bg-accent-soft font-semibold text-accent-strong" : "border-line bg-card text-ink"}`;
  return (
    <div className="mx-auto flex w-full max-w-2xl flex-col gap-4">
      <div>
        <h1 className="text-2xl font-bold tracking-tight">Due</h1>
        <p className="text-sm text-muted">
          {weekWords(week)}: {dateWords(week.from)} to {dateWords(week.to)}
          {personName ? ` · for ${personName}` : " · everyone"}. Times are in {timeZone.replaceAll("_", " ")}.
        </p>
      </div>
      <nav aria-label="Week" className="flex flex-wrap items-center gap-2">
        <Link className={chip(false)} href={href({ week: week.offset - 1 })}>
          ← Previous week
        </Link>
        <Link className={chip(week.offset === 0)} href={href({ week: 0 })} aria-current={week.offset === 0 ? "page" : undefined}>
          This week
        </Link>
        <Link className={chip(false)} href={href({ week: week.offset + 1 })}>
          Next week →
        </Link>
      </nav>
      <nav aria-label="Person" className="flex flex-wrap items-center gap-2">
        {user.role === "crew" ? (
          <>
            <Link className={chip(personId === user.id)} href={href({ person: user.id })} aria-current={personId === user.id ? "page" : undefined}>
              My week
            </Link>
            <Link className={chip(!personId)} href={href({ person: null })} aria-current={!personId ? "page" : undefined}>
              All my projects
            </Link>
          </>
        ) : (
          <>
            <Link className={chip(!personId)} href={href({ person: null })} aria-current={!personId ? "page" : undefined}>
              Everyone
            </Link>
            {people.map((p) => (
              <Link key={p.id} className={chip(personId === p.id)} href={href({ person: p.id })} aria-current={personId === p.id ? "page" : undefined}>
                {p.id === user.id ? "Me" : p.name}
              </Link>
            ))}
          </>
        )}
      </nav>
      {groups.overdue.length > 0 && (
        <section aria-labelledby="due-overdue" className="flex flex-col gap-2">
          <h2 id="due-overdue" className="font-semibold text-danger">
            Overdue ({groups.overdue.length})
          </h2>
          <ul className="flex flex-col gap-2">
            {groups.overdue.map((i) => (
              <DueItemLine key={i.key} item={i} showDay />
            ))}
          </ul>
        </section>
      )}
      {groups.days.map((d) => (
        <section key={d.day} aria-labelledby={`due-${d.day}`} className="flex flex-col gap-2">
          <h2 id={`due-${d.day}`} className="font-semibold">
            {d.label}
            {d.today && <span className="ml-2 text-sm font-normal text-accent">today</span>}
          </h2>
          <ul className="flex flex-col gap-2">
            {d.items.map((i) => (
              <DueItemLine key={i.key} item={i} />
            ))}
          </ul>
        </section>
      ))}
      {groups.days.length === 0 && (
        <EmptyState title={week.offset === 0 ? "Nothing due this week" : `Nothing due ${weekWords(week).toLowerCase()}`}>
          {groups.overdue.length ? "Only the overdue work above." : "No visits booked, no equipment falling due and no warranty ending."}
        </EmptyState>
      )}
    </div>
  );
}
