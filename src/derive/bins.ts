import { quantileSorted7 } from './quantile.js';

/** How a histogram's bin width was found. */
export type BinRule = 'freedman-diaconis' | 'sturges' | 'single-value';

/** A nice number m × 10^exponent, m one of 1, 2, 5: kept as its parts so edges are computed exactly. */
export interface NiceStep {
  mantissa: 1 | 2 | 5;
  exponent: number;
}

/** A histogram's bins: edges, counts, and how the width was chosen. */
export interface Binning {
  rule: BinRule;
  /** The width the rule gave, before rounding to a nice step. */
  rawWidth: number;
  /** The width drawn: a nice step. */
  width: number;
  /** Whether the nice width was widened past the nearest one to keep at most the most bins drawn. */
  widened: boolean;
  /** k + 1 ascending edges at multiples of the width. Bins are [x0, x1), the last [x0, x1]. */
  edges: number[];
  /** k counts, one per bin; they sum to the number of values. */
  counts: number[];
}

/** Freedman–Diaconis bin width, 2 · IQR · n^(−1/3) (Freedman & Diaconis 1981), IQR by Hyndman–Fan type 7. */
export function freedmanDiaconisWidth(sorted: readonly number[]): number {
  const iqr = quantileSorted7(sorted, 0.75) - quantileSorted7(sorted, 0.25);
  return (2 * iqr) / Math.cbrt(sorted.length);
}

/** Sturges' bin width: the range over ⌈log₂ n⌉ + 1 bins (Sturges 1926). */
export function sturgesWidth(sorted: readonly number[]): number {
  const range = sorted[sorted.length - 1]! - sorted[0]!;
  return range / (Math.ceil(Math.log2(sorted.length)) + 1);
}

/** The nice step (1, 2 or 5 × 10^k) nearest a positive width, by ratio. */
export function nearestNiceStep(width: number): NiceStep {
  const exponent = Math.floor(Math.log10(width));
  let best: NiceStep = { mantissa: 1, exponent };
  let bestGap = Infinity;
  for (const [mantissa, e] of [[1, exponent], [2, exponent], [5, exponent], [1, exponent + 1]] as const) {
    const gap = Math.abs(Math.log(width / stepValue({ mantissa, exponent: e })));
    if (gap < bestGap) [best, bestGap] = [{ mantissa, exponent: e }, gap];
  }
  return best;
}

/** The next nice step up: 1 → 2 → 5 → 10. */
export function nextNiceStep(s: NiceStep): NiceStep {
  return s.mantissa === 1 ? { mantissa: 2, exponent: s.exponent } : s.mantissa === 2 ? { mantissa: 5, exponent: s.exponent } : { mantissa: 1, exponent: s.exponent + 1 };
}

/** i × step as the double nearest the decimal (0.1 × 3 is 0.3, not 0.30000000000000004). */
export function stepMultiple(i: number, s: NiceStep): number {
  return s.exponent >= 0 ? i * s.mantissa * 10 ** s.exponent : (i * s.mantissa) / 10 ** -s.exponent;
}

function stepValue(s: NiceStep): number {
  return stepMultiple(1, s);
}

/** Edges at multiples of the step from below the least value to at or above the greatest; undefined when they are not finite and increasing. */
function edgesFor(lo: number, hi: number, s: NiceStep, maxBins: number): number[] | undefined {
  const w = stepValue(s);
  let first = Math.floor(lo / w);
  let last = Math.ceil(hi / w);
  // Beyond 2^53 bin indexes are no longer distinct integers (and i − 1 may equal i): too fine a step for these values.
  if (!(Math.abs(first) < 2 ** 53 && Math.abs(last) < 2 ** 53) || last - first > maxBins) return undefined;
  while (stepMultiple(first, s) > lo) first--;
  while (stepMultiple(last, s) < hi) last++;
  if (last === first) last++;
  if (last - first > maxBins) return undefined;
  const edges: number[] = [];
  for (let i = first; i <= last; i++) edges.push(stepMultiple(i, s));
  return edges.every((e, i) => Number.isFinite(e) && (i === 0 || e > edges[i - 1]!)) ? edges : undefined;
}

/** How many values fall in each bin: [x0, x1), the last bin closed. */
export function countInBins(sorted: readonly number[], edges: readonly number[]): number[] {
  const k = edges.length - 1;
  const counts = new Array<number>(k).fill(0);
  const w = edges[1]! - edges[0]!;
  for (const v of sorted) {
    let i = Math.min(k - 1, Math.max(0, Math.floor((v - edges[0]!) / w)));
    // The division can land one bin off near an edge: the edges themselves decide.
    while (i > 0 && v < edges[i]!) i--;
    while (i < k - 1 && v >= edges[i + 1]!) i++;
    counts[i]!++;
  }
  return counts;
}

/** The rule's width: Freedman–Diaconis, Sturges when the IQR is zero, and a tenth of the value (or 1) when every value is the same. */
function ruleWidth(sorted: readonly number[]): { rule: BinRule; rawWidth: number } {
  const fd = freedmanDiaconisWidth(sorted);
  if (fd > 0 && Number.isFinite(fd)) return { rule: 'freedman-diaconis', rawWidth: fd };
  const st = sturgesWidth(sorted);
  if (st > 0 && Number.isFinite(st)) return { rule: 'sturges', rawWidth: st };
  return { rule: 'single-value', rawWidth: Math.abs(sorted[0]!) / 10 || 1 };
}

/**
 * Bins for values sorted ascending (at least one, all finite): the rule's width rounded to the
 * nearest nice step, edges at its multiples, widened one nice step at a time while more than
 * `maxBins` bins would be needed. Undefined when the values span more than doubles can hold.
 */
export function binValues(sorted: readonly number[], maxBins: number): Binning | undefined {
  if (!Number.isFinite(sorted[sorted.length - 1]! - sorted[0]!)) return undefined;
  const { rule, rawWidth } = ruleWidth(sorted);
  if (!(rawWidth > 0) || !Number.isFinite(rawWidth)) return undefined;
  const nearest = nearestNiceStep(rawWidth);
  // Start no finer than the span over maxBins, so a long tail costs one jump, not many widenings.
  const finest = (sorted[sorted.length - 1]! - sorted[0]!) / maxBins;
  let step = rawWidth >= finest ? nearest : nearestNiceStep(finest);
  for (let tries = 0; tries < 40; tries++, step = nextNiceStep(step)) {
    const edges = edgesFor(sorted[0]!, sorted[sorted.length - 1]!, step, maxBins);
    if (!edges) continue;
    return { rule, rawWidth, width: stepValue(step), widened: stepValue(step) !== stepValue(nearest), edges, counts: countInBins(sorted, edges) };
  }
  return undefined;
}
