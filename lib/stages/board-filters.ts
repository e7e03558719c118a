import type { Stage } from "./stages";

export type FilterableCard = {
  title: string;
  clientName: string;
  siteTown: string;
  stage: Stage;
  stageEnteredAt: string;
  targetInstallDate: string | null;
  /** When the card was expected to leave its stage (lib/stages/durations); null when the stage has no end. */
  expectedBy: string | null;
  leadId: string | null;
  crew: { id: string }[];
};

export type BoardFilters = { person?: string; overdue?: boolean; q?: string };

const DAY = 86_400_000;

/** Whole days since `iso`, never negative. */
export function daysSince(iso: string, now: Date): number {
  return Math.max(0, Math.floor((now.getTime() - new Date(iso).getTime()) / DAY));
}

/**
 * Late against its own stage only: longer in the stage than the company expects that stage to take.
 * A target install date already past does not make a cycling tank late.
 */
export function isOverdue(card: FilterableCard, now: Date): boolean {
  return card.expectedBy !== null && now.getTime() > new Date(card.expectedBy).getTime();
}

export function matchesFilters(card: FilterableCard, f: BoardFilters, now: Date): boolean {
  if (f.person && card.leadId !== f.person && !card.crew.some((c) => c.id === f.person)) return false;
  if (f.overdue && !isOverdue(card, now)) return false;
  const q = f.q?.trim().toLowerCase();
  if (q && ![card.title, card.clientName, card.siteTown].some((s) => s.toLowerCase().includes(q))) return false;
  return true;
}

/** Filters from a URL query, ignoring anything malformed. */
export function filtersFromQuery(get: (key: string) => string | null): BoardFilters {
  const person = get("person");
  return {
    person: person && /^[0-9a-f-]{36}$/i.test(person) ? person : undefined,
    overdue: get("overdue") === "1",
    q: get("q")?.slice(0, 100) || undefined,
  };
}

export function filtersToQuery(f: BoardFilters): string {
  const p = new URLSearchParams();
  if (f.person) p.set("person", f.person);
  if (f.overdue) p.set("overdue", "1");
  if (f.q?.trim()) p.set("q", f.q.trim());
  const s = p.toString();
  return s ? `?${s}` : "";
}
