import { addDays, dayLabel, weekStart, type Ymd } from "./local-dates";

/** One thing to do: a booked visit, an equipment service falling due, or a warranty ending. */
export type DueItem = {
  key: string;
  type: "visit" | "service" | "warranty";
  /** The day it falls on, in the company's time zone. */
  day: Ymd;
  /** For visits, the start, so a day's visits keep their order. */
  at?: string;
  projectId: string;
  projectTitle: string;
  title: string;
  detail?: string;
  href: string;
  /** The person a visit is assigned to; equipment belongs to the project's crew. */
  assigneeId: string | null;
  assigneeName: string | null;
  crewIds: string[];
};

export type DueWeek = { from: Ymd; to: Ymd; offset: number };

/** The week `offset` weeks from the one holding `today` (Monday to Sunday). */
export function dueWeek(today: Ymd, offset = 0): DueWeek {
  const from = addDays(weekStart(today), 7 * offset);
  return { from, to: addDays(from, 6), offset };
}

/**
 * Who the list is for: everyone, or one person. For a person: visits assigned to them, and the
 * equipment and warranties of projects they are on the crew of (nobody is assigned equipment).
 */
export function itemIsFor(item: DueItem, personId: string | null): boolean {
  if (!personId) return true;
  if (item.type === "visit") return item.assigneeId === personId;
  return item.crewIds.includes(personId);
}

export type DueGroups = { overdue: DueItem[]; days: { day: Ymd; label: string; today: boolean; items: DueItem[] }[]; count: number };

const TYPE_ORDER: Record<DueItem["type"], number> = { visit: 0, service: 1, warranty: 2 };

function byDayThenKind(a: DueItem, b: DueItem): number {
  return a.day.localeCompare(b.day) || TYPE_ORDER[a.type] - TYPE_ORDER[b.type] || (a.at ?? "").localeCompare(b.at ?? "") || a.projectTitle.localeCompare(b.projectTitle) || a.key.localeCompare(b.key);
}

/**
 * The due list for one week: what is overdue on top (a visit or service before today; a warranty
 * that has ended is not work, so it is left out), then the week's days that have something, in order.
 * An overdue item is shown once, on top, even when the week viewed is a past one.
 */
export function groupDueItems(items: DueItem[], opts: { today: Ymd; week: DueWeek; personId: string | null }): DueGroups {
  const mine = items.filter((i) => itemIsFor(i, opts.personId));
  const overdue = mine.filter((i) => i.day < opts.today && i.type !== "warranty").sort(byDayThenKind);
  const inWeek = mine.filter((i) => i.day >= opts.week.from && i.day <= opts.week.to && !(i.day < opts.today && i.type !== "warranty")).sort(byDayThenKind);
  const days: DueGroups["days"] = [];
  for (const item of inWeek) {
    const last = days.at(-1);
    if (last?.day === item.day) last.items.push(item);
    else days.push({ day: item.day, label: dayLabel(item.day), today: item.day === opts.today, items: [item] });
  }
  return { overdue, days, count: overdue.length + inWeek.length };
}

/** "This week", "Next week", "Last week", or the week's dates. */
export function weekWords(week: DueWeek): string {
  if (week.offset === 0) return "This week";
  if (week.offset === 1) return "Next week";
  if (week.offset === -1) return "Last week";
  return `Week of ${dayLabel(week.from)}`;
}
