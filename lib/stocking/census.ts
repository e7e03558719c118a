/**
 * The census of a tank's fish, rebuilt from its livestock events. A group's fish are either in the
 * display or in one of the company's holding tanks; every event moves fish between those places or
 * out of the record, and an event that would take more fish than a place holds is refused.
 */
export const EVENT_KINDS = ["added", "lost", "to_holding", "from_holding", "rehomed", "measured", "behaviour"] as const;
export type EventKind = (typeof EVENT_KINDS)[number];

export const EVENT_LABELS: Record<EventKind, string> = {
  added: "Added",
  lost: "Lost",
  to_holding: "Moved to a holding tank",
  from_holding: "Back from a holding tank",
  rehomed: "Rehomed",
  measured: "Measured",
  behaviour: "Behaviour note",
};

export type Place = "display" | "holding";

export type LivestockEvent = {
  kind: EventKind;
  count: number | null;
  /** For lost and rehomed: where the fish were. */
  place?: Place | null;
};

export type GroupCount = { display: number; holding: number };

/** Event kinds that change the count, and so need a count above zero. */
export const COUNTED_KINDS: EventKind[] = ["added", "lost", "to_holding", "from_holding", "rehomed"];

/** The counts after one event, or an error saying why it can't happen. */
export function applyEvent(state: GroupCount, e: LivestockEvent): { ok: true; state: GroupCount } | { ok: false; message: string } {
  const n = e.count ?? 0;
  if (COUNTED_KINDS.includes(e.kind) && (!Number.isInteger(n) || n < 1)) return { ok: false, message: "Enter how many fish, one or more." };
  const take = (place: Place) => {
    const have = state[place];
    if (n > have) return { ok: false as const, message: `Only ${have} ${have === 1 ? "fish is" : "fish are"} in the ${place === "display" ? "display" : "holding tank"}; you can't move or remove ${n}.` };
    return { ok: true as const, state: { ...state, [place]: have - n } };
  };
  switch (e.kind) {
    case "added":
      return { ok: true, state: { ...state, display: state.display + n } };
    case "lost":
    case "rehomed":
      return take(e.place ?? "display");
    case "to_holding": {
      const r = take("display");
      return r.ok ? { ok: true, state: { ...r.state, holding: r.state.holding + n } } : r;
    }
    case "from_holding": {
      const r = take("holding");
      return r.ok ? { ok: true, state: { ...r.state, display: r.state.display + n } } : r;
    }
    case "measured":
    case "behaviour":
      return { ok: true, state };
  }
}

/** Counts after every event in order; throws on a history that doesn't add up (the writes refuse those). */
export function censusOf(events: LivestockEvent[]): GroupCount {
  let state: GroupCount = { display: 0, holding: 0 };
  for (const e of events) {
    const r = applyEvent(state, e);
    if (!r.ok) throw new Error(r.message);
    state = r.state;
  }
  return state;
}

export type Measurement = { at: Date; lengthMm: number };

/** Length over time for a growth chart: measured events in date order. */
export function growthSeries(events: { kind: EventKind; at: Date; lengthMm: number | null }[]): Measurement[] {
  return events
    .filter((e) => e.kind === "measured" && e.lengthMm != null)
    .map((e) => ({ at: e.at, lengthMm: e.lengthMm as number }))
    .sort((a, b) => a.at.getTime() - b.at.getTime());
}
