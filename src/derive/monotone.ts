// Monotone cubic interpolation after M. Steffen, "A simple method for monotonic interpolation in
// one dimension", Astronomy and Astrophysics 239:443–450, 1990 (the method of d3-shape's
// curveMonotoneX): between two data points the curve never leaves the interval of their values,
// so a thickness that is never negative at the points is never negative between them.

const sign = (x: number) => (x < 0 ? -1 : x > 0 ? 1 : 0);

/** The tangent (dy/dx) at each point of a monotone cubic through (xs[i], ys[i]); xs strictly increasing. */
export function monotoneTangents(xs: readonly number[], ys: readonly number[]): number[] {
  const n = xs.length;
  if (n < 2) return new Array<number>(n).fill(0);
  const secant = (i: number) => (ys[i + 1]! - ys[i]!) / (xs[i + 1]! - xs[i]!);
  if (n === 2) return [secant(0), secant(0)];
  const t = new Array<number>(n).fill(0);
  for (let i = 1; i < n - 1; i++) {
    const [h0, h1] = [xs[i]! - xs[i - 1]!, xs[i + 1]! - xs[i]!];
    const [s0, s1] = [secant(i - 1), secant(i)];
    const p = (s0 * h1 + s1 * h0) / (h0 + h1);
    t[i] = (sign(s0) + sign(s1)) * Math.min(Math.abs(s0), Math.abs(s1), 0.5 * Math.abs(p)) || 0;
  }
  // Ends: the one-sided three-point estimate, which keeps the end intervals monotone too.
  t[0] = (3 * secant(0) - t[1]!) / 2;
  t[n - 1] = (3 * secant(n - 2) - t[n - 2]!) / 2;
  return t;
}

/** The value at x (between xs[i] and xs[i + 1]) of the cubic Hermite with end values y0, y1 and tangents t0, t1. */
export function hermiteAt(x0: number, x1: number, y0: number, y1: number, t0: number, t1: number, x: number): number {
  const h = x1 - x0;
  const s = (x - x0) / h;
  const [s2, s3] = [s * s, s * s * s];
  return (2 * s3 - 3 * s2 + 1) * y0 + (s3 - 2 * s2 + s) * h * t0 + (-2 * s3 + 3 * s2) * y1 + (s3 - s2) * h * t1;
}
