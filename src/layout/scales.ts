import { scaleLinear } from 'd3-scale';
import type { ValueTicks } from './axis.js';
import type { TimeScale } from './time-scale.js';

/** A continuous scale with its ticks: data value → px. */
export interface LinearScale {
  kind: 'linear';
  domain: [number, number];
  range: [number, number];
  ticks: number[];
  labels: string[];
  /** Which tick labels are printed (in a cramped plot some keep only their gridline). */
  shown: boolean[];
  map(value: number): number;
}

/** A band scale: one equal band per category, in order. */
export interface BandScale {
  kind: 'band';
  domain: string[];
  range: [number, number];
  /** Distance from one band's start to the next, in px. */
  step: number;
  /** Width of a band, in px (the step less the padding). */
  bandwidth: number;
  /** Start of a category's band, in px. */
  start(category: string): number;
  /** Middle of a category's band, in px. */
  center(category: string): number;
}

/** Any scale an axis can draw. */
export type Scale = LinearScale | BandScale | TimeScale;

export type { TimeScale };

/** A linear scale over ticks chosen for it, mapping their domain onto `range`. */
export function linearScale(ticks: ValueTicks, range: [number, number]): LinearScale {
  const [d0, d1] = ticks.domain;
  const [r0, r1] = range;
  // A domain from about -1.8e308 to 1.8e308 spans more than a double holds; halving every term
  // is exact and keeps the arithmetic finite.
  const map = Number.isFinite(d1 - d0) ? scaleLinear().domain(ticks.domain).range(range) : (v: number) => r0 + ((v / 2 - d0 / 2) / (d1 / 2 - d0 / 2)) * (r1 - r0);
  return { kind: 'linear', domain: ticks.domain, range, ticks: ticks.ticks, labels: ticks.labels, shown: ticks.shown, map: (v) => map(v) };
}

/**
 * A band scale over categories with the style's padding: `padding` between bands and half of it
 * outside the first and last, so the step is exactly the range divided by the count. The
 * arithmetic is d3-scale's `scaleBand` (align 0.5, no rounding) step for step, written out
 * because building a d3 band scale rescales on every setter and interns the domain twice, and
 * layout builds one per plot box it tries. A repeated category keeps its first band, as in d3.
 */
export function bandScale(domain: readonly string[], range: [number, number], padding: number): BandScale {
  const index = new Map<string, number>();
  const unique: string[] = [];
  for (const c of domain) if (!index.has(c)) index.set(c, unique.push(c) - 1);
  const n = unique.length;
  const [r0, r1] = range;
  const reverse = r1 < r0;
  const stop = reverse ? r0 : r1;
  let start = reverse ? r1 : r0;
  const [inner, outer] = [Math.min(1, padding), padding / 2];
  const step = (stop - start) / Math.max(1, n - inner + outer * 2);
  start += (stop - start - step * (n - inner)) * 0.5;
  const width = step * (1 - inner);
  const at = (c: string) => {
    const i = index.get(c);
    return i === undefined ? NaN : start + step * (reverse ? n - 1 - i : i);
  };
  return { kind: 'band', domain: unique, range, step, bandwidth: width, start: at, center: (c) => at(c) + width / 2 };
}

/** The scale as a band scale; a form asking for the wrong kind is a defect in that form. */
export function asBand(scale: Scale): BandScale {
  if (scale.kind !== 'band') throw new Error(`expected a band scale, got ${scale.kind}`);
  return scale;
}

/** The scale as a linear scale; a form asking for the wrong kind is a defect in that form. */
export function asLinear(scale: Scale): LinearScale {
  if (scale.kind !== 'linear') throw new Error(`expected a linear scale, got ${scale.kind}`);
  return scale;
}
