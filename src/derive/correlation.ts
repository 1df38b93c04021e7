import { fsum } from 'd3-array';

/**
 * Pearson's correlation coefficient of two equally long samples, with compensated sums; NaN when
 * either sample is constant (or has fewer than two values), where r is undefined.
 */
export function pearson(xs: readonly number[], ys: readonly number[]): number {
  const n = xs.length;
  if (n < 2 || ys.length !== n) return Number.NaN;
  const [mx, my] = [fsum(xs) / n, fsum(ys) / n];
  const sxy = fsum(xs, (x, i) => (x - mx) * (ys[i]! - my));
  const sxx = fsum(xs, (x) => (x - mx) ** 2);
  const syy = fsum(ys, (y) => (y - my) ** 2);
  if (!(sxx > 0) || !(syy > 0)) return Number.NaN;
  return Math.max(-1, Math.min(1, sxy / Math.sqrt(sxx * syy)));
}

/** The matrix of Pearson r between every pair of columns (1 on the diagonal). */
export function correlationMatrix(columns: readonly (readonly number[])[]): number[][] {
  return columns.map((a, i) => columns.map((b, j) => (i === j ? 1 : j < i ? Number.NaN : pearson(a, b)))).map((row, i, m) => row.map((r, j) => (j < i ? m[j]![i]! : r)));
}
