import { fsum } from 'd3-array';

/** A least-squares line y = intercept + slope·x, with Pearson's r and the number of points it fits. */
export interface LinearFit {
  intercept: number;
  slope: number;
  /** Pearson's correlation coefficient of x and y. */
  r: number;
  n: number;
}

/**
 * The ordinary least-squares line through paired values, and Pearson's r. Sums are taken about
 * the means (two passes, d3-array's exact `fsum`), which keeps large offsets from cancelling.
 * Undefined when there are fewer than 3 points or either variable is constant (no line, or no r).
 */
export function leastSquares(xs: readonly number[], ys: readonly number[]): LinearFit | undefined {
  const n = Math.min(xs.length, ys.length);
  if (n < 3) return undefined;
  const mx = fsum(xs.slice(0, n)) / n;
  const my = fsum(ys.slice(0, n)) / n;
  const dx = xs.slice(0, n).map((x) => x - mx);
  const dy = ys.slice(0, n).map((y) => y - my);
  const sxx = fsum(dx, (d) => d * d);
  const syy = fsum(dy, (d) => d * d);
  const sxy = fsum(dx, (d, i) => d * dy[i]!);
  if (!(sxx > 0) || !(syy > 0) || !Number.isFinite(sxx * syy)) return undefined;
  const slope = sxy / sxx;
  // Rounding can take |r| a hair past 1 for exactly collinear points.
  const r = Math.max(-1, Math.min(1, sxy / Math.sqrt(sxx) / Math.sqrt(syy)));
  return { intercept: my - slope * mx, slope, r, n };
}
