import { quantileSorted7 } from '../derive/quantile.js';
import type { DotRow } from '../derive/dots.js';
import { type NumberStyle, valueFormatter } from '../layout/number-format.js';
import type { DataTable } from '../scene/types.js';
import { count, extremes, extremesReading, type AltText } from './alt-words.js';

/**
 * Dot plot: the largest and smallest value; a dumbbell (two values per key) also names the
 * widest gap between its two ends.
 */
export function dotAlt(rows: readonly DotRow[], what: string, names: readonly string[], format: NumberStyle | undefined): AltText {
  const fmt = valueFormatter(rows.flatMap((r) => r.values.filter((v) => !Number.isNaN(v))), format);
  if (names.length < 2) return { what, reading: extremesReading(rows.map((r) => ({ label: r.label, value: r.values[0]! })), fmt) };
  const ends = rows.flatMap((r) => r.values.map((v, i) => ({ label: `${r.label} (${names[i]})`, value: v })));
  const gaps = rows.filter((r) => r.values.every((v) => !Number.isNaN(v))).map((r) => ({ label: r.label, value: r.values[1]! - r.values[0]!, row: r }));
  const widest = extremes(gaps.map((g) => ({ ...g, value: Math.abs(g.value) })))?.top;
  const gap = widest ? `; the widest gap is ${widest.label}, from ${fmt(widest.row.values[0]!)} (${names[0]}) to ${fmt(widest.row.values[1]!)} (${names[1]})` : '';
  return { what, reading: `${extremesReading(ends, fmt, ['highest', 'lowest'])}${gap}` };
}

/** Dense pixel layout: the range (with the items at its ends, when named) and the median. */
export function denseAlt(values: Float64Array, labels: readonly string[] | undefined, what: string, format: NumberStyle | undefined): AltText {
  const sorted = values.filter((v) => !Number.isNaN(v)).sort();
  const head = `${what}, ${count(values.length, 'item')}`;
  if (sorted.length === 0) return { what: head, reading: '' };
  const [lo, hi, mid] = [sorted[0]!, sorted[sorted.length - 1]!, quantileSorted7(Array.from(sorted), 0.5)];
  const fmt = valueFormatter([lo, hi, mid], format);
  // The first item at each end, in drawing order, names it.
  const name = (v: number) => (labels ? ` ${labels[values.indexOf(v)]}` : '');
  const range = lo === hi ? `all at ${fmt(lo)}` : `highest${name(hi)} (${fmt(hi)}), lowest${name(lo)} (${fmt(lo)})`;
  return { what: head, reading: `${range}; median ${fmt(mid)}` };
}

/** The items drawn, in drawing order: key (or the item's number without one) and value (empty when missing). */
export function denseData(values: Float64Array, labels: readonly string[] | undefined, key: string, value: string): DataTable {
  return { columns: [key, value], rows: Array.from(values, (v, i) => ({ [key]: labels?.[i] ?? i + 1, [value]: Number.isNaN(v) ? null : v })) };
}
