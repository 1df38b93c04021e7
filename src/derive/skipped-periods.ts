import type { DateGrain } from '../table/types.js';
import { stepGrain, units } from './dates.js';
import type { LineSeries } from './lines.js';

/** A run of periods a regular series skips: the present keys either side of it. */
export interface SkippedPeriods {
  series: string | undefined;
  after: number;
  before: number;
}

/** The most common step between a series' keys, in its grain's units, when at least half the steps are it. */
export function regularStep(steps: readonly number[]): number | undefined {
  const counts = new Map<number, number>();
  for (const s of steps) counts.set(s, (counts.get(s) ?? 0) + 1);
  const [step, count] = [...counts].sort((a, b) => b[1] - a[1] || a[0] - b[0])[0] ?? [0, 0];
  return step > 0 && count * 2 >= steps.length ? step : undefined;
}

const DAY = 86_400_000;

/** Whether every day strictly between two days is a Saturday or a Sunday (UTC): business-day data skips weekends by design. */
export function onlyWeekend(from: number, to: number): boolean {
  for (let t = from + DAY; t < to; t += DAY) {
    const wd = new Date(t).getUTCDay();
    if (wd !== 0 && wd !== 6) return false;
  }
  return true;
}

/**
 * A regular series (monthly, daily, yearly: at least half its steps equal) that skips whole
 * periods has no rows for them: they are missing, and the line must not join across them as if
 * it knew their values. Each skipped run becomes a gap (a NaN point one step after the last key
 * present), and is reported. Irregular series (survey dates, times of day) are left as they are,
 * and so are the weekends of a daily series of business days.
 */
export function breakSkippedPeriods(s: LineSeries, dataGrain: DateGrain): { series: LineSeries; skipped: SkippedPeriods[] } {
  const grain = stepGrain(s.xs, dataGrain);
  if (grain !== 'year' && grain !== 'month' && grain !== 'day') return { series: s, skipped: [] };
  const u = s.xs.map((x) => units(x, grain));
  const steps = u.slice(1).map((v, i) => v - u[i]!);
  const step = regularStep(steps);
  if (step === undefined || steps.every((d) => d === step)) return { series: s, skipped: [] };
  const out: LineSeries = { label: s.label, xs: [], ys: [], rows: [] };
  const skipped: SkippedPeriods[] = [];
  for (let i = 0; i < s.xs.length; i++) {
    out.xs.push(s.xs[i]!);
    out.ys.push(s.ys[i]!);
    out.rows.push(s.rows[i]!);
    const d = steps[i];
    if (d === undefined || d <= step || d % step !== 0) continue;
    if (grain === 'day' && step === 1 && onlyWeekend(s.xs[i]!, s.xs[i + 1]!)) continue;
    // The gap stands between the two keys present; its key is never drawn.
    out.xs.push((s.xs[i]! + s.xs[i + 1]!) / 2);
    out.ys.push(Number.NaN);
    out.rows.push(-1);
    skipped.push({ series: s.label, after: s.xs[i]!, before: s.xs[i + 1]! });
  }
  return { series: out, skipped };
}
