/**
 * How a board card says who is on a project and how long it has been in its stage: names, not
 * initials; a date, not a count of days. Pure, so the server and the browser render the same words.
 */

const MONTHS = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"];

/** A calendar day in UTC ("29 Nov", or "29 Nov 2025" when not this year), so server and browser agree. */
export function dayWords(iso: string, now: Date): string {
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return "an unknown day";
  const base = `${d.getUTCDate()} ${MONTHS[d.getUTCMonth()]}`;
  return d.getUTCFullYear() === now.getUTCFullYear() ? base : `${base} ${d.getUTCFullYear()}`;
}

/** "here since today", "here since yesterday", "here since 29 Nov". */
export function sinceWords(iso: string, now: Date): string {
  const day = (t: Date) => Date.UTC(t.getUTCFullYear(), t.getUTCMonth(), t.getUTCDate());
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return "here since an unknown day";
  const diff = Math.round((day(now) - day(d)) / 86_400_000);
  if (diff <= 0) return "here since today";
  if (diff === 1) return "here since yesterday";
  return `here since ${dayWords(iso, now)}`;
}

/**
 * Short names for a list of people: the first name, with the family name's initial only where two
 * share a first name ("Teo, Priya"; "Sam B., Sam K.").
 */
export function shortNames(names: readonly string[]): string[] {
  const parts = names.map((n) => n.trim().split(/\s+/).filter(Boolean));
  const firsts = parts.map((p) => p[0] ?? "");
  return parts.map((p, i) => {
    const first = firsts[i];
    if (!first) return "Someone";
    const clash = firsts.some((f, j) => j !== i && f === first);
    return clash && p.length > 1 ? `${first} ${p[p.length - 1][0]}.` : first;
  });
}

/** The people on a card: "Maren with Teo, Priya"; "Teo, Priya" with no lead; "Nobody assigned yet". */
export function peopleWords(leadName: string | null, crewNames: readonly string[]): string {
  const all = shortNames([...(leadName ? [leadName] : []), ...crewNames]);
  if (all.length === 0) return "Nobody assigned yet";
  if (!leadName) return all.join(", ");
  const [lead, ...crew] = all;
  return crew.length ? `${lead} with ${crew.join(", ")}` : lead;
}
