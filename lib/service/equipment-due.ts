import { DEFAULT_SERVICE_INTERVAL_DAYS, EQUIPMENT_KINDS, type EquipmentKind } from "./equipment-kinds";
import { addDays, daysBetween, type Ymd } from "./local-dates";

/** Limits on a service interval, in days: at least daily, at most ten years. */
export const SERVICE_INTERVAL_LIMITS = { min: 1, max: 3650 } as const;
/** A service due within this many days reads "due soon" (common practice: two weeks to plan a visit). */
export const DUE_SOON_DAYS = 14;
/** A warranty ending within this many days is flagged, so a fault can still be claimed. */
export const WARRANTY_SOON_DAYS = 30;

/** The company's own intervals per kind: a number overrides the default, null means "no routine service". */
export type CompanyIntervals = Partial<Record<string, number | null>>;

export type IntervalSource = "piece" | "company" | "common practice";
export type ServiceInterval = { days: number; source: IntervalSource };

/**
 * How often a piece is serviced: its own interval, else the company's for its kind, else the
 * kind's common-practice default. Null when none of them sets one.
 */
export function serviceIntervalFor(piece: { kind: EquipmentKind; serviceIntervalDays: number | null }, company: CompanyIntervals): ServiceInterval | null {
  if (piece.serviceIntervalDays != null) return { days: piece.serviceIntervalDays, source: "piece" };
  if (Object.hasOwn(company, piece.kind)) {
    const days = company[piece.kind];
    return days == null ? null : { days, source: "company" };
  }
  const fallback = DEFAULT_SERVICE_INTERVAL_DAYS[piece.kind];
  return fallback == null ? null : { days: fallback, source: "common practice" };
}

/** The company's interval for each kind after its overrides (null: no routine service). */
export function effectiveKindIntervals(company: CompanyIntervals): Record<EquipmentKind, number | null> {
  const out = { ...DEFAULT_SERVICE_INTERVAL_DAYS };
  for (const kind of EQUIPMENT_KINDS) if (Object.hasOwn(company, kind)) out[kind] = company[kind] ?? null;
  return out;
}

/**
 * What to store for the company's intervals from the values the lead saved: only the kinds that
 * differ from the common-practice default, so a later change to a default still reaches them.
 */
export function companyIntervalOverrides(saved: Partial<Record<EquipmentKind, number | null>>): CompanyIntervals {
  const out: CompanyIntervals = {};
  for (const kind of EQUIPMENT_KINDS) {
    if (!Object.hasOwn(saved, kind)) continue;
    const value = saved[kind] ?? null;
    if (value !== DEFAULT_SERVICE_INTERVAL_DAYS[kind]) out[kind] = value;
  }
  return out;
}

/**
 * The day the next service falls due: the last service (or, never serviced, the day it was
 * installed) plus the interval. Null when there is no interval or nothing to count from.
 */
export function nextServiceDue(opts: { lastServicedOn: Ymd | null; installedOn: Ymd | null; intervalDays: number | null }): Ymd | null {
  const from = opts.lastServicedOn ?? opts.installedOn;
  if (!from || opts.intervalDays == null) return null;
  return addDays(from, opts.intervalDays);
}

export type DueState = "overdue" | "due today" | "due soon" | "later";

/** Where a due date stands from `today`: overdue, today, within `soonDays`, or later. */
export function dueState(dueOn: Ymd, today: Ymd, soonDays = DUE_SOON_DAYS): DueState {
  const left = daysBetween(today, dueOn);
  if (left < 0) return "overdue";
  if (left === 0) return "due today";
  return left <= soonDays ? "due soon" : "later";
}

const days = (n: number) => `${n} ${n === 1 ? "day" : "days"}`;

/** The due date in words: "overdue by 3 days", "due today", "due soon: in 5 days", "due in 40 days". */
export function dueWords(dueOn: Ymd, today: Ymd, soonDays = DUE_SOON_DAYS): string {
  const left = daysBetween(today, dueOn);
  switch (dueState(dueOn, today, soonDays)) {
    case "overdue":
      return `overdue by ${days(-left)}`;
    case "due today":
      return "due today";
    case "due soon":
      return `due soon: in ${days(left)}`;
    default:
      return `due in ${days(left)}`;
  }
}

export type WarrantyState = "ended" | "ends today" | "ending soon" | "covered";

/** Where a warranty stands; null when none was recorded. The last day of cover is `warrantyUntil` itself. */
export function warrantyState(warrantyUntil: Ymd | null, today: Ymd, soonDays = WARRANTY_SOON_DAYS): WarrantyState | null {
  if (!warrantyUntil) return null;
  const left = daysBetween(today, warrantyUntil);
  if (left < 0) return "ended";
  if (left === 0) return "ends today";
  return left <= soonDays ? "ending soon" : "covered";
}

/** The warranty in words, or null when none was recorded. */
export function warrantyWords(warrantyUntil: Ymd | null, today: Ymd, soonDays = WARRANTY_SOON_DAYS): string | null {
  const state = warrantyState(warrantyUntil, today, soonDays);
  if (!state || !warrantyUntil) return null;
  const left = daysBetween(today, warrantyUntil);
  if (state === "ended") return `warranty ended ${days(-left)} ago`;
  if (state === "ends today") return "warranty ends today";
  if (state === "ending soon") return `warranty ending soon: ${days(left)} left`;
  return `under warranty for ${days(left)}`;
}

/** Checks on a piece's own dates; each message names the field it is about. */
export function equipmentDateProblems(p: { installedOn: Ymd | null; warrantyUntil: Ymd | null; lastServicedOn?: Ymd | null }, today: Ymd): { field: string; message: string }[] {
  const out: { field: string; message: string }[] = [];
  if (p.installedOn && p.warrantyUntil && p.warrantyUntil < p.installedOn) out.push({ field: "warrantyUntil", message: "The warranty can't end before the piece was installed." });
  if (p.installedOn && p.installedOn > addDays(today, 366)) out.push({ field: "installedOn", message: "The install date is more than a year ahead; check the year." });
  if (p.lastServicedOn && p.lastServicedOn > today) out.push({ field: "lastServicedOn", message: "The last service can't be in the future." });
  if (p.lastServicedOn && p.installedOn && p.lastServicedOn < p.installedOn) out.push({ field: "lastServicedOn", message: "The last service can't be before the piece was installed." });
  return out;
}

const ELECTRIC =
  "Mains electricity near water: switch off and unplug before putting a hand in the water or opening the unit, keep a drip loop in every cable, and run it all through RCD (GFCI) protection. Wiring, sockets and anything hard-wired are for a licensed electrician.";
const CO2 = "Pressurised gas: close the cylinder valve before opening the regulator or tubing, keep the cylinder upright and secured, and have the regulator serviced by a qualified gas fitter.";
const DOSING = "Dosing chemicals: wear gloves and eye protection, keep each product in its labelled container away from children and food, and follow its own safety sheet.";
const CHILLER = "A chiller holds refrigerant under pressure: cleaning the filter and coils is routine, anything on the refrigerant circuit is for a certified refrigeration engineer.";
const UV = "UV light harms eyes and skin: unplug the clarifier before opening it and never look at a lit lamp.";

/** The cautions shown with a kind of equipment before it is serviced. */
export function equipmentCautions(kind: EquipmentKind): string[] {
  switch (kind) {
    case "heater":
      return [ELECTRIC, "Let a heater cool in the water for 15 minutes after unplugging before lifting it out: hot glass cracks in air (common practice)."];
    case "canister filter":
    case "sump return pump":
    case "protein skimmer":
    case "lighting":
      return [ELECTRIC];
    case "UV clarifier":
      return [ELECTRIC, UV];
    case "chiller":
      return [ELECTRIC, CHILLER];
    case "CO2 system":
      return [CO2, ELECTRIC];
    case "dosing pump":
      return [DOSING, ELECTRIC];
    default:
      return [ELECTRIC];
  }
}

export type PieceDue = {
  interval: ServiceInterval | null;
  dueOn: Ymd | null;
  dueState: DueState | null;
  dueWords: string;
  warrantyState: WarrantyState | null;
  warrantyWords: string | null;
};

/** Everything a register line says about a piece's next service and its warranty, from `today`. */
export function pieceDue(
  piece: { kind: EquipmentKind; serviceIntervalDays: number | null; installedOn: Ymd | null; warrantyUntil: Ymd | null; lastServicedOn: Ymd | null },
  company: CompanyIntervals,
  today: Ymd,
): PieceDue {
  const interval = serviceIntervalFor(piece, company);
  const dueOn = nextServiceDue({ lastServicedOn: piece.lastServicedOn, installedOn: piece.installedOn, intervalDays: interval?.days ?? null });
  let words: string;
  if (dueOn) words = dueWords(dueOn, today);
  else if (!interval) words = "no routine service";
  else words = "next service unknown: add the install date or record a service";
  return { interval, dueOn, dueState: dueOn ? dueState(dueOn, today) : null, dueWords: words, warrantyState: warrantyState(piece.warrantyUntil, today), warrantyWords: warrantyWords(piece.warrantyUntil, today) };
}
