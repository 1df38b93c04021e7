import type { DerivedLines, LineSeries } from '../derive/lines.js';
import type { PeriodChange } from '../derive/period-change.js';
import { inSentence } from '../fields/labels.js';
import { labelStyle, valueFormatter } from '../layout/number-format.js';
import { count, extremes, someNames, trendReading, type AltText, type TrendPoint } from './alt-words.js';
import { keyName } from './line-text.js';

/** Lines read one by one, up to this many; beyond, the highest and lowest ends and the biggest riser (common practice: a screen reader reads a handful of lines, not ten). */
const LINES_READ = 3;

interface SeriesTrend {
  label: string | undefined;
  first: TrendPoint;
  last: TrendPoint;
  peak: TrendPoint;
}

/** A series' first, last and highest present points, named on the key; undefined for a series with no value. */
function seriesTrend(derived: DerivedLines, s: LineSeries): SeriesTrend | undefined {
  const present = s.ys.map((_, i) => i).filter((i) => !Number.isNaN(s.ys[i]!));
  if (present.length === 0) return undefined;
  const at = (i: number): TrendPoint => ({ value: s.ys[i]!, at: keyName(derived, s.xs[i]!) });
  const peak = present.reduce((a, b) => (s.ys[b]! > s.ys[a]! ? b : a));
  return { label: s.label, first: at(present[0]!), last: at(present[present.length - 1]!), peak: at(peak) };
}

/**
 * The trend reading of each line ("Harbour rose 45% from …"), ordered by its last value, highest
 * first; the numbers written alike, by the chart's value formatter over the numbers the text
 * names (a million points need not be formatted to write three).
 */
function trends(derived: DerivedLines): { label: string | undefined; text: string }[] {
  const all = derived.series.flatMap((s) => seriesTrend(derived, s) ?? []);
  all.sort((a, b) => b.last.value - a.last.value);
  const fmt = valueFormatter(all.flatMap((t) => [t.first.value, t.last.value, t.peak.value]), labelStyle(derived.query.value));
  // One line needs no name (a panel of small multiples is named by its level).
  const named = all.length > 1;
  return all.map((t) => ({ label: t.label, text: `${named && t.label !== undefined ? `${t.label} ` : ''}${trendReading(t.first, t.last, t.peak, fmt)}` }));
}

/**
 * The alt text of a line chart or an index line chart: what is traced over what span, then each
 * line's direction with its change from first to last and its peak (up to LINES_READ lines; the
 * rest are counted).
 */
export function lineAlt(derived: DerivedLines, noun: string, valueTitle: string): AltText {
  const [from, to] = derived.keyExtent;
  const n = derived.series.length;
  const what = `${noun} of ${inSentence(valueTitle)} by ${inSentence(derived.query.key.label)}, ${keyName(derived, from)} to ${keyName(derived, to)}, ${n === 1 ? 'one line' : count(n, 'line')}`;
  const read = trends(derived);
  const rest = read.slice(LINES_READ).map((t) => t.label ?? '');
  const more = rest.length ? [`${count(rest.length, 'more line')} not read out: ${someNames(rest)}.`] : [];
  return { what, reading: read.slice(0, LINES_READ).map((t) => t.text).join('; '), more };
}

/** The alt text of period-over-period change bars: the biggest rise and fall, and the last period's change. */
export function changeBarAlt(changes: readonly PeriodChange[], what: string): AltText {
  const fmt = valueFormatter(changes.map((c) => c.change));
  const pct = (n: number) => `${fmt(n)} %`;
  const e = extremes(changes.map((c) => ({ label: c.label, value: c.change })));
  const name = (v: number, most: boolean) => (v > 0 ? `${most ? 'biggest' : 'smallest'} rise` : v < 0 ? `${most ? 'smallest' : 'biggest'} fall` : 'no change');
  const reading = !e ? '' : e.top === e.low ? `${e.top.label} (${pct(e.top.value)})` : `${name(e.top.value, true)} ${e.top.label} (${pct(e.top.value)}), ${name(e.low.value, false)} ${e.low.label} (${pct(e.low.value)})`;
  const last = changes[changes.length - 1];
  return { what: `${what}, ${count(changes.length, 'bar')}`, reading, more: last ? [`The last, ${last.label}, ${last.change > 0 ? 'rose' : last.change < 0 ? 'fell' : 'was unchanged'} ${pct(Math.abs(last.change))}.`] : [] };
}
