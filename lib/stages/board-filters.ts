import { stageIndex, type Stage } from "./stages";

/** A card stuck this long in one stage counts as overdue. Our own rule, common practice for install planning. */
export const STUCK_DAYS = 21;

export type FilterableCard = {
  title: string;
  clientName: string;
  siteTown: string;
  stage: Stage;
  stageEnteredAt: string;
  targetInstallDate: string | null;
  leadId: string | null;
  crew: { id: string }[];
};

export type BoardFilters = { person?: string; overdue?: boolean; q?: string };

const DAY = 86_400_000;

/** Whole days since `iso`, never negative. */
export function daysSince(iso: string, now: Date): number {
  return Math.max(0, Math.floor((now.getTime() - new Date(iso).getTime()) / DAY));
}

/** Past its target install date and not yet in service, or stuck in its stage. */
export function isOverdue(card: FilterableCard, now: Date): boolean {
  if (card.stage === "in_service") return false;
  const today = now.toISOString().slice(0, 10);
  if (card.targetInstallDate && card.targetInstallDate < today && stageIndex(card.stage) < stageIndex("in_service")) return true;
  return daysSince(card.stageEnteredAt, now) >= STUCK_DAYS;
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
