import type { DateGrain } from '../table/types.js';

const DAY = 86_400_000;

/** A time as a count of its grain's units: months for month data, days for day data, else ms. */
export function units(time: number, grain: DateGrain): number {
  const d = new Date(time);
  if (grain === 'year') return d.getUTCFullYear();
  if (grain === 'month') return d.getUTCFullYear() * 12 + d.getUTCMonth();
  if (grain === 'day') return Math.round(time / DAY);
  return time;
}

/**
 * The first uneven step between consecutive dates, in the data's own grain (calendar months
 * for month data, so February is one step like March), or undefined when every step is equal.
 */
export function firstUnevenStep(times: readonly number[], grain: DateGrain): { after: number; step: number; usual: number } | undefined {
  if (times.length < 3) return undefined;
  const steps = times.slice(1).map((t, i) => units(t, grain) - units(times[i]!, grain));
  const counts = new Map<number, number>();
  for (const s of steps) counts.set(s, (counts.get(s) ?? 0) + 1);
  const usual = [...counts].sort((a, b) => b[1] - a[1] || a[0] - b[0])[0]![0];
  const i = steps.findIndex((s) => s !== usual);
  return i < 0 ? undefined : { after: times[i]!, step: steps[i]!, usual };
}
