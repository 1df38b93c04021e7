/** A series of a streamgraph: its name and its thickness at each key, in key order. */
export interface StreamSeries {
  name: string;
  values: readonly number[];
}

/** The first key at which a series has a positive value (its onset); Infinity for a series that never does. */
export function onsetOf(values: readonly number[]): number {
  const i = values.findIndex((v) => v > 0);
  return i < 0 ? Infinity : i;
}

const byCodePoint = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

/** Series sorted by onset; ties: larger total first, then name by code points. */
export function byOnset<S extends StreamSeries>(series: readonly S[]): S[] {
  const total = (s: S) => s.values.reduce((a, b) => a + b, 0);
  return [...series].sort((a, b) => onsetOf(a.values) - onsetOf(b.values) || total(b) - total(a) || byCodePoint(a.name, b.name));
}

/**
 * The inside-out layer order of Byron & Wattenberg (2008): series sorted by onset (ties: larger
 * total first, then name by code points), the first in the middle and the rest placed alternately
 * above and below, so that late-starting layers sit at the outside where their onset does not
 * shift every layer beside them. Returns the series bottom layer first.
 */
export function insideOutOrder<S extends StreamSeries>(series: readonly S[]): S[] {
  const sorted = byOnset(series);
  const above: S[] = [];
  const below: S[] = [];
  sorted.forEach((s, i) => (i % 2 === 0 ? above : below).push(s));
  return [...below.reverse(), ...above];
}
