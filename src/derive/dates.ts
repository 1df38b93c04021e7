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

/** Whether a UTC time is midnight on the first of its month. */
function monthStart(time: number): boolean {
  const d = new Date(time);
  return d.getUTCDate() === 1 && time % DAY === 0;
}

/**
 * The grain a run of dates steps in: dates written to the day (or finer) that all fall on the
 * first of a month are monthly, quarterly or yearly data, so their steps are counted in calendar
 * months (January to February is one step like March to April), not in days.
 */
export function stepGrain(times: readonly number[], grain: DateGrain): DateGrain {
  if (grain === 'year' || grain === 'month' || times.length === 0) return grain;
  return times.every((t) => Number.isNaN(t) || monthStart(t)) ? 'month' : grain;
}

/**
 * The first uneven step between consecutive dates, counted in calendar units (see stepGrain;
 * calendar months for monthly data, so February is one step like March), or undefined when
 * every step is equal. `grain` is the unit the steps were counted in.
 */
export function firstUnevenStep(times: readonly number[], dataGrain: DateGrain): { after: number; step: number; usual: number; grain: DateGrain } | undefined {
  if (times.length < 3) return undefined;
  const grain = stepGrain(times, dataGrain);
  const steps = times.slice(1).map((t, i) => units(t, grain) - units(times[i]!, grain));
  const counts = new Map<number, number>();
  for (const s of steps) counts.set(s, (counts.get(s) ?? 0) + 1);
  const usual = [...counts].sort((a, b) => b[1] - a[1] || a[0] - b[0])[0]![0];
  const i = steps.findIndex((s) => s !== usual);
  return i < 0 ? undefined : { after: times[i]!, step: steps[i]!, usual, grain };
}
