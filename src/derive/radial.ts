/**
 * Where each of n keys of a cycle sits around a circle: the centre angle of its sector, in
 * degrees clockwise from 12 o'clock. The first key is centred at 12 o'clock and the keys follow
 * in cycle order, so the last key's sector ends where the first key's begins.
 */
export function cycleAngles(n: number): number[] {
  return Array.from({ length: n }, (_, i) => (360 * i) / n);
}

/**
 * The outer radius of a radial bar: its length grows from the inner ring in proportion to its
 * value, so that `max` reaches the outer ring. Lengths, not areas, carry the value (the area of an
 * outer bar grows faster, which the rationale states).
 */
export function radialBarRadius(value: number, max: number, inner: number, outer: number): number {
  if (!(max > 0)) return inner;
  return inner + ((outer - inner) * value) / max;
}
