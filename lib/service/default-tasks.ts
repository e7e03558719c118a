/** A routine visit's tasks before the lead writes their own (our wording, from common practice). */
export const DEFAULT_SERVICE_TASKS = [
  "Partial water change to the plan's share",
  "Glass cleaned inside and out",
  "Substrate vacuumed where open",
  "Plants trimmed and dead leaves removed",
  "Water test logged",
  "Filter intake and pre-filter rinsed in tank water",
  "Heater and pumps checked running",
] as const;
