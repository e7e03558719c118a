/**
 * An invented but typical fishless cycle, read every other day from day 0: ammonia falls over the
 * first two weeks while nitrite peaks, then nitrite falls and nitrate builds. Demo data only.
 */
export type DemoReading = { day: number; ammonia: number; nitrite: number; nitrate: number; pH: number };

const STEPS = [0, 0.25, 0.5, 1, 2, 4];
const kit = (v: number) => STEPS.reduce((best, s) => (Math.abs(s - v) < Math.abs(best - v) ? s : best), 0);

export function cycleSeries(daysSoFar: number): DemoReading[] {
  const out: DemoReading[] = [];
  for (let day = 0; day <= daysSoFar; day += day >= 24 ? 1 : 2) {
    const ammonia = day < 16 ? 2 * Math.exp(-day / 5) : 0;
    const nitrite = day < 4 ? 0 : day < 24 ? 2.2 * Math.sin((Math.PI * (day - 4)) / 20) : 0;
    const nitrate = day < 8 ? 0 : Math.min(40, (day - 8) * 2.5);
    out.push({ day, ammonia: kit(ammonia), nitrite: kit(nitrite), nitrate: Math.round(nitrate / 5) * 5, pH: day < 20 ? 7.8 : 7.6 });
  }
  return out;
}
