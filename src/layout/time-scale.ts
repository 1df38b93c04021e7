import { tickStep } from 'd3-array';
import { utcDay, utcHour, utcMinute, utcMonday, utcMonth, utcYear, type CountableTimeInterval, type TimeInterval } from 'd3-time';
import { timeFormatLocale } from 'd3-time-format';

import type { Locale } from '../brief/types.js';
import { localeDef } from '../fields/locales.js';

/** The calendar unit a time axis is labelled in. */
export type TimeGrain = 'minute' | 'hour' | 'day' | 'week' | 'month' | 'quarter' | 'year';

/** A UTC time scale: epoch milliseconds to pixels, with calendar ticks and their labels. */
export interface TimeScale {
  kind: 'time';
  domain: [number, number];
  range: [number, number];
  /** The pixel position of a time (epoch ms); linear, not clamped. */
  map(t: number): number;
  /** Tick times (epoch ms), ascending, inside the domain, on calendar boundaries in UTC. */
  ticks: number[];
  /** One label per tick, in the grain's format. */
  labels: string[];
  /** The unit the ticks step by. */
  grain: TimeGrain;
}

/**
 * The label formats of a locale, from our own table (src/fields/locales.ts) rather than
 * d3-time-format's default locale, which is module state any library in the process may
 * replace. Made on first use (not at module load: a cold start that draws no time axis pays nothing).
 */
function formats(name: Locale | undefined) {
  const def = localeDef(name);
  const locale = timeFormatLocale({
    dateTime: '%a %e %b %Y %H:%M:%S', date: '%Y-%m-%d', time: '%H:%M:%S', periods: ['AM', 'PM'],
    days: [...def.days] as TimeDays, shortDays: [...def.shortDays] as TimeDays,
    months: [...def.months] as TimeMonths, shortMonths: [...def.shortMonths] as TimeMonths,
  });
  // Only utcFormat: a label must never depend on the zone of the machine drawing it.
  return { year: locale.utcFormat('%Y'), month: locale.utcFormat('%b'), monthYear: locale.utcFormat(def.patterns.monthYear), day: locale.utcFormat(def.patterns.day), clock: locale.utcFormat('%H:%M'), quarter: def.quarter };
}

type TimeDays = [string, string, string, string, string, string, string];
type TimeMonths = [string, string, string, string, string, string, string, string, string, string, string, string];

const MINUTE = 60_000;
const HOUR = 60 * MINUTE;
const DAY = 24 * HOUR;
const WEEK = 7 * DAY;
// Nominal lengths, used only to pick the step nearest the wanted tick spacing (as d3-scale does).
const MONTH = 30 * DAY;
const YEAR = 365 * DAY;

/** One calendar step: its grain, the d3-time interval that makes its ticks, and its nominal length in ms. */
export interface TimeStep { grain: TimeGrain; interval: TimeInterval; duration: number }

const step = (grain: TimeGrain, base: CountableTimeInterval, k: number, unit: number): TimeStep =>
  ({ grain, interval: k === 1 ? base : base.every(k)!, duration: k * unit });

/** The calendar steps a time axis may use, shortest first (the UTC intervals of d3-time). */
const STEPS: readonly TimeStep[] = [
  step('minute', utcMinute, 1, MINUTE), step('minute', utcMinute, 5, MINUTE),
  step('minute', utcMinute, 15, MINUTE), step('minute', utcMinute, 30, MINUTE),
  step('hour', utcHour, 1, HOUR), step('hour', utcHour, 3, HOUR),
  step('hour', utcHour, 6, HOUR), step('hour', utcHour, 12, HOUR),
  step('day', utcDay, 1, DAY), step('day', utcDay, 2, DAY),
  // ISO 8601 weeks start on Monday.
  step('week', utcMonday, 1, WEEK), step('week', utcMonday, 2, WEEK),
  step('month', utcMonth, 1, MONTH), step('month', utcMonth, 2, MONTH),
  step('quarter', utcMonth, 3, MONTH), step('month', utcMonth, 6, MONTH),
  step('year', utcYear, 1, YEAR),
];

/** The grains from finest to coarsest. */
const GRAIN_ORDER: readonly TimeGrain[] = ['minute', 'hour', 'day', 'week', 'month', 'quarter', 'year'];

/**
 * The calendar step whose length is nearest (by ratio) to span / approxTicks; beyond a year,
 * a nice number of years (1, 2, 5 × 10ⁿ). No step finer than `finest` (the data's own grain:
 * monthly data gets no ticks between its months). Default: any step.
 */
export function timeStep(start: number, stop: number, approxTicks: number, finest: TimeGrain = 'minute'): TimeStep {
  const target = Math.abs(stop - start) / Math.max(1, approxTicks);
  const last = STEPS[STEPS.length - 1]!;
  if (target > last.duration) {
    const years = Math.max(1, tickStep(start / YEAR, stop / YEAR, Math.max(1, approxTicks)));
    return step('year', utcYear, years, YEAR);
  }
  const allowed = STEPS.filter((s) => GRAIN_ORDER.indexOf(s.grain) >= GRAIN_ORDER.indexOf(finest));
  let best = allowed[0]!;
  for (const s of allowed) {
    if (Math.abs(Math.log(s.duration / target)) < Math.abs(Math.log(best.duration / target))) best = s;
  }
  return best;
}

/** Labels for ticks at a grain, in a locale's names (default English); months (and half years) print the year only where it changes. */
export function timeLabels(ticks: readonly number[], grain: TimeGrain, locale?: Locale): string[] {
  const f = formats(locale);
  return ticks.map((t, i) => {
    const d = new Date(t);
    switch (grain) {
      case 'year': return f.year(d);
      case 'quarter': return f.quarter(Math.floor(d.getUTCMonth() / 3) + 1, f.year(d));
      case 'month': {
        const yearChanged = i === 0 || new Date(ticks[i - 1]!).getUTCFullYear() !== d.getUTCFullYear();
        return yearChanged ? f.monthYear(d) : f.month(d);
      }
      case 'week': case 'day': return f.day(d);
      // A tick at midnight names its day, so a run of hours across days stays readable
      // (common practice; d3-scale's multi-scale format does the same).
      case 'hour': case 'minute': return utcDay.floor(d).getTime() === t ? f.day(d) : f.clock(d);
    }
  });
}

/** A UTC time in months since year 0: whole months at each month's start, the fraction of its month between. */
export function monthUnits(t: number): number {
  const d = new Date(t);
  const [y, m] = [d.getUTCFullYear(), d.getUTCMonth()];
  // setUTCFullYear, not Date.UTC, which reads years 0–99 as 1900–1999.
  const start = new Date(0).setUTCFullYear(y, m, 1);
  const next = new Date(0).setUTCFullYear(y, m + 1, 1);
  return y * 12 + m + (t - start) / (next - start);
}

/**
 * A UTC time scale from `domain` (epoch ms) onto `range` (px), with about `approxTicks`
 * ticks on calendar boundaries: minutes, hours, days, ISO weeks, months, quarters or years.
 * Ticks are d3-time's own `interval.range`, so they never drift from the calendar; labels
 * are formatted in UTC at the ticks' grain ("2025", "Q1 2025", "Jan 2025" / "Feb", "4 Oct",
 * "06:00"). A domain given high-to-low maps high-to-low; ticks are always ascending. A
 * non-finite domain gets no ticks. `finest` is the finest grain ticks may take (the data's own);
 * at month grain or coarser, positions are in calendar months (each month the same width).
 * `locale` names the months ("Okt. 2026" in de). Default: English.
 */
export function timeScale(domain: [number, number], range: [number, number], approxTicks: number, finest: TimeGrain = 'minute', locale?: Locale): TimeScale {
  const [r0, r1] = range;
  // Data given by month, quarter or year is placed in calendar months, each the same width, so
  // three months are three times one month whatever their days (February is not 10% shorter).
  const unit = GRAIN_ORDER.indexOf(finest) >= GRAIN_ORDER.indexOf('month') ? monthUnits : (t: number) => t;
  const [d0, d1] = domain;
  const [u0, u1] = [unit(d0), unit(d1)];
  const map = (t: number) => (u1 === u0 ? (r0 + r1) / 2 : r0 + ((unit(t) - u0) / (u1 - u0)) * (r1 - r0));
  const lo = Math.min(d0, d1);
  const hi = Math.max(d0, d1);
  const chosen = timeStep(lo, hi, approxTicks, finest);
  // interval.range stops before its end; + 1 ms lets a tick fall on the domain's last instant.
  const ticks = Number.isFinite(lo) && Number.isFinite(hi)
    ? chosen.interval.range(new Date(lo), new Date(hi + 1)).map((d) => d.getTime())
    : [];
  return { kind: 'time', domain: [d0, d1], range: [r0, r1], map, ticks, labels: timeLabels(ticks, chosen.grain, locale), grain: chosen.grain };
}
