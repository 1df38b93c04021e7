/**
 * The p-quantile of values sorted ascending, by Hyndman & Fan's definition 7 (R's default,
 * d3-array's `quantileSorted`): h = (n − 1)p, Q(p) = x⌊h⌋ + (h − ⌊h⌋)(x⌊h⌋+1 − x⌊h⌋) on 0-based
 * sorted x. NaN for no values.
 */
export function quantileSorted7(sorted: readonly number[], p: number): number {
  const n = sorted.length;
  if (n === 0) return NaN;
  if (p <= 0 || n === 1) return sorted[0]!;
  if (p >= 1) return sorted[n - 1]!;
  const h = (n - 1) * p;
  const i = Math.floor(h);
  const lo = sorted[i]!;
  const hi = sorted[i + 1]!;
  // Equal neighbours give their value exactly (no 0 × ∞ for values near the largest double).
  return lo === hi ? lo : lo + (h - i) * (hi - lo);
}

/** A box plot's numbers: quartiles, the whisker ends, and the values beyond them. */
export interface BoxStats {
  n: number;
  q1: number;
  median: number;
  q3: number;
  /** The lowest value within 1.5 IQR below q1 (the lower whisker's end). */
  low: number;
  /** The highest value within 1.5 IQR above q3 (the upper whisker's end). */
  high: number;
  /** Values beyond the whiskers, ascending. */
  outliers: number[];
}

/** Tukey's fence: whiskers reach the most extreme values within 1.5 IQR of the quartiles (Tukey 1977, Exploratory Data Analysis). */
export const WHISKER_IQR = 1.5;

/**
 * The box of values sorted ascending (at least one): quartiles by Hyndman–Fan type 7, whiskers
 * to the most extreme data point within WHISKER_IQR × IQR of the box, and every value beyond.
 */
export function boxStats(sorted: readonly number[]): BoxStats {
  const q1 = quantileSorted7(sorted, 0.25);
  const median = quantileSorted7(sorted, 0.5);
  const q3 = quantileSorted7(sorted, 0.75);
  const reach = WHISKER_IQR * (q3 - q1);
  const [fenceLow, fenceHigh] = [q1 - reach, q3 + reach];
  let low = q1;
  let high = q3;
  const outliers: number[] = [];
  for (const v of sorted) {
    if (v < fenceLow || v > fenceHigh) outliers.push(v);
    else {
      low = Math.min(low, v);
      high = Math.max(high, v);
    }
  }
  return { n: sorted.length, q1, median, q3, low, high, outliers };
}
