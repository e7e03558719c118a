/**
 * Kinds of equipment a tank can carry, and how often each is usually serviced.
 * Intervals are common practice in the trade, not a maker's instruction: the company
 * overrides them in Settings and each piece can carry its own.
 */
export const EQUIPMENT_KINDS = [
  "canister filter",
  "sump return pump",
  "heater",
  "chiller",
  "UV clarifier",
  "lighting",
  "protein skimmer",
  "CO2 system",
  "dosing pump",
  "other",
] as const;

export type EquipmentKind = (typeof EQUIPMENT_KINDS)[number];

/** Days between services when neither the piece nor the company says otherwise (common practice); null: no routine service. */
export const DEFAULT_SERVICE_INTERVAL_DAYS: Record<EquipmentKind, number | null> = {
  "canister filter": 120, // cleaned every three to six months (common practice)
  "sump return pump": 180,
  heater: 180,
  chiller: 180,
  "UV clarifier": 180,
  lighting: 365,
  "protein skimmer": 30,
  "CO2 system": 90,
  "dosing pump": 90,
  other: null,
};
