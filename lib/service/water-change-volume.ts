/**
 * Litres to change at a routine visit: the plan's share of the water the system holds (the
 * display's net volume from its design, after rock and substrate, plus the sump, which is part of
 * the same water). Rounded to whole litres: nobody measures a change finer with buckets or a hose.
 * Null when the design gives no volume, so the crew enters litres themselves.
 */
export function waterChangeLitres(percent: number, volume: { netVolumeL: number; sumpVolumeL?: number } | null): number | null {
  if (!volume || !Number.isFinite(percent) || percent <= 0) return null;
  const system = volume.netVolumeL + (volume.sumpVolumeL ?? 0);
  if (!Number.isFinite(system) || system <= 0) return null;
  return Math.round((Math.min(percent, 100) / 100) * system);
}
