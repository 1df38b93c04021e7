import { quantileSorted, tickStep, ticks } from 'd3-array';

/** One colour class: the values from `from` up to `to` (the last class includes its `to`). */
export interface ColourClass {
  from: number;
  to: number;
  fill: string;
}

/** How the class boundaries were chosen. */
export type ClassMethod = 'equal-interval' | 'quantile' | 'diverging';

/** Values binned into colour classes, lowest first. */
export interface ColourClasses {
  method: ClassMethod;
  classes: ColourClass[];
  /** The centre of a diverging scale. */
  midpoint?: number;
}

/** Most colour classes drawn: a reader tells only about 10 steps of one colour scale apart (common practice; the figure). */
export const MAX_CLASSES = 10;
/** Classes aimed at for a sequential scale (nice boundaries may give a few more or fewer). */
const TARGET_CLASSES = 7;
/** Equal intervals give way to quantiles when one class would hold more than this share of the values. */
export const SKEW_SHARE = 0.5;

/** The index of the class holding v (values below the first go to it, above the last to the last). */
export function classOf(classes: readonly ColourClass[], v: number): number {
  let lo = 0;
  let hi = classes.length - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (classes[mid]!.from <= v) lo = mid;
    else hi = mid - 1;
  }
  return lo;
}

/** Nice equal-interval boundaries covering [lo, hi], at most `most` classes (d3-array's ticks: 1, 2 or 5 × 10ⁿ steps). */
export function equalIntervalBreaks(lo: number, hi: number, most: number): number[] {
  for (let target = TARGET_CLASSES; target >= 1; target--) {
    const step = tickStep(lo, hi, target);
    const start = Math.floor(lo / step) * step;
    const stop = Math.ceil(hi / step) * step;
    const breaks = ticks(start, stop, Math.round((stop - start) / step));
    // Spans near the smallest doubles give no usable steps: then one class from lo to hi.
    if (breaks.length >= 2 && breaks.length - 1 <= most && breaks[0]! <= lo && breaks[breaks.length - 1]! >= hi) return breaks;
  }
  return [lo, hi];
}

/** Boundaries at the quantiles of the sorted values, duplicates merged: classes of about equal counts. */
export function quantileBreaks(sorted: ArrayLike<number>, k: number): number[] {
  const qs = Array.from({ length: k + 1 }, (_, i) => quantileSorted(sorted as number[], i / k)!);
  return qs.filter((q, i) => i === 0 || q > qs[i - 1]!);
}

/** k colours spread evenly over a ramp, first to last (its lightness order kept). */
export function spreadRamp(ramp: readonly string[], k: number): string[] {
  if (k === 1) return [ramp[Math.floor(ramp.length / 2)]!];
  return Array.from({ length: k }, (_, i) => ramp[Math.round((i * (ramp.length - 1)) / (k - 1))]!);
}

/** The share of the values in the fullest class of these boundaries. */
function fullestShare(sorted: Float64Array, breaks: readonly number[]): number {
  const bins = breaks.slice(0, -1).map((from, i) => ({ from, to: breaks[i + 1]!, fill: '' }));
  const counts = new Array<number>(bins.length).fill(0);
  for (const v of sorted) counts[classOf(bins, v)]!++;
  return Math.max(...counts) / sorted.length;
}

/**
 * Sequential classes: nice equal intervals, unless one of them would hold more than SKEW_SHARE
 * of the values (a skewed distribution would show in one colour); then quantiles, so each class
 * holds about as many values (unless `equalOnly`). At most the ramp's steps and MAX_CLASSES.
 */
export function sequentialClasses(sorted: Float64Array, ramp: readonly string[], equalOnly = false): ColourClasses {
  const [lo, hi] = [sorted[0]!, sorted[sorted.length - 1]!];
  const most = Math.min(MAX_CLASSES, ramp.length);
  if (lo === hi) return { method: 'equal-interval', classes: [{ from: lo, to: hi, fill: spreadRamp(ramp, 1)[0]! }] };
  const equal = equalIntervalBreaks(lo, hi, most);
  const quantile = !equalOnly && fullestShare(sorted, equal) > SKEW_SHARE ? quantileBreaks(sorted, Math.min(most, TARGET_CLASSES)) : undefined;
  const breaks = quantile && quantile.length > 2 ? quantile : equal;
  const fills = spreadRamp(ramp, breaks.length - 1);
  return { method: breaks === equal ? 'equal-interval' : 'quantile', classes: fills.map((fill, i) => ({ from: breaks[i]!, to: breaks[i + 1]!, fill })) };
}

/**
 * Diverging classes: equal steps away from the midpoint on both sides (the same step, and the
 * same lightness at the same distance), at most 5 a side, only as far as the data reach.
 * The ramp's neutral middle is not used for a class.
 */
export function divergingClasses(lo: number, hi: number, midpoint: number, ramp: readonly string[]): ColourClasses {
  const half = (ramp.length - 1) / 2;
  const perSide = Math.min(half, MAX_CLASSES / 2);
  const reach = Math.max(midpoint - lo, hi - midpoint) || 1;
  const fits = (step: number) => Math.ceil(reach / step - 1e-9) <= perSide;
  let step = tickStep(0, reach, perSide);
  for (let count = perSide - 1; !fits(step) && count >= 1; count--) step = Math.max(step, tickStep(0, reach, count));
  if (!fits(step)) step = reach / perSide;
  const [below, above] = [Math.ceil((midpoint - lo) / step - 1e-9), Math.ceil((hi - midpoint) / step - 1e-9)];
  const span = Math.max(below, above, 1);
  const colour = (j: number, sign: -1 | 1) => ramp[half + sign * Math.round((j * half) / span)]!;
  const classes: ColourClass[] = [];
  for (let j = below; j >= 1; j--) classes.push({ from: midpoint - j * step, to: midpoint - (j - 1) * step, fill: colour(j, -1) });
  for (let j = 1; j <= Math.max(above, below ? 0 : 1); j++) classes.push({ from: midpoint + (j - 1) * step, to: midpoint + j * step, fill: colour(j, 1) });
  return { method: 'diverging', classes, midpoint };
}
