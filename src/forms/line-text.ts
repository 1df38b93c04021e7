import type { DerivedLines, LineQuery, LineSeries } from '../derive/lines.js';
import { formatDate, inSentence, quarterName } from '../fields/labels.js';
import { axisTitle } from '../layout/axis.js';
import { combinedTitle } from './combining.js';

/** The value axis title of a line chart. */
export function lineValueTitle(query: LineQuery): string {
  const { value, aggregate } = query;
  if (!value) return 'Number of rows';
  return combinedTitle(axisTitle(value, value.label), aggregate, query.combined);
}

/** A key position as a reader names it: a date at the data's grain, a number, or the ordinal level. */
export function keyName(derived: DerivedLines, x: number): string {
  const { key } = derived.query;
  const column = derived.keyColumn;
  if (derived.quarterly) return quarterName(x, key.locale);
  if (column.type === 'date') return formatDate(x, column.grain ?? 'day', key.locale);
  if (key.type === 'ordinal' || key.type === 'cyclic' || key.type === 'categorical') return key.levels[x] ?? String(x);
  return String(x);
}

/** The last present point of a series, if any. */
export function lastPresent(s: LineSeries): number | undefined {
  for (let i = s.ys.length - 1; i >= 0; i--) if (!Number.isNaN(s.ys[i]!)) return i;
  return undefined;
}

/** One or two sentences for screen readers: what is traced over what, its span, and where each line ends. */
export function lineDescription(derived: DerivedLines, noun: string, valueTitle: string, fmt: (n: number) => string): string {
  const [from, to] = derived.keyExtent;
  const what = `${noun} of ${inSentence(valueTitle)} by ${inSentence(derived.query.key.label)}, ${keyName(derived, from)} to ${keyName(derived, to)}`;
  const ends = derived.series.flatMap((s) => {
    const i = lastPresent(s);
    return i === undefined ? [] : [`${s.label === undefined ? '' : `${s.label} `}${fmt(s.ys[i]!)} at ${keyName(derived, s.xs[i]!)}`];
  });
  const shown = ends.slice(0, 8).join('; ');
  const lines = derived.series.length === 1 ? 'one line' : `${derived.series.length} lines`;
  return `${what}, ${lines}; ending ${shown}${ends.length > 8 ? '; …' : ''}.`;
}
