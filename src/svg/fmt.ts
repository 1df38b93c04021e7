/** Decimal places of every coordinate written into SVG: 1/100 px is below what any raster shows. */
export const PRECISION = 2;

/**
 * Writes a number into SVG: fixed precision, trailing zeros dropped, never `-0`, never an
 * exponent. A non-finite number is a defect upstream and throws.
 */
export function fmt(n: number): string {
  if (!Number.isFinite(n)) throw new RangeError(`non-finite number in scene: ${n}`);
  // String() switches to exponent form from 1e21; no coordinate of a real chart comes near.
  if (Math.abs(n) >= 1e15) throw new RangeError(`number too large for a coordinate: ${n}`);
  const f = 10 ** PRECISION;
  const r = Math.round(n * f) / f;
  if (r === 0) return '0';
  // k/100 as a double prints as its shortest round-trip form, which is the ≤ 2-decimal one.
  return String(r);
}

/** Rewrites every number in path data through `fmt`. */
export function fmtPath(d: string): string {
  return d.replace(/-?\d*\.?\d+(?:e[-+]?\d+)?/gi, (m) => fmt(Number(m)));
}
