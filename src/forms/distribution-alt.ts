import { max } from 'd3-array';
import type { BoxStats } from '../derive/quantile.js';
import { inSentence } from '../fields/labels.js';
import { labelStyle, type NumberStyle, valueFormatter } from '../layout/number-format.js';
import { count, type AltText } from './alt-words.js';
import type { DerivedGroups } from './groups.js';
import type { DerivedHistogram } from './histogram.js';

/** "median 5.1 minutes, middle half from 2.3 to 8 (IQR 5.7)": centre and spread, Hyndman–Fan type 7 quartiles as the box plot draws them. */
function centreAndSpread(stats: BoxStats, fmt: (n: number) => string, unit: string): string {
  return `median ${fmt(stats.median)}${unit}, middle half from ${fmt(stats.q1)} to ${fmt(stats.q3)}${unit} (IQR ${fmt(stats.q3 - stats.q1)})`;
}

/** The numbers a distribution's alt text writes, written alike. */
function statsFormatter(stats: readonly BoxStats[], format: NumberStyle | undefined): (n: number) => string {
  return valueFormatter(stats.flatMap((s) => [s.median, s.q1, s.q3, s.q3 - s.q1]), format);
}

/** Histogram: centre and spread of the values, and the fullest bin. */
export function histogramAlt(d: DerivedHistogram): AltText {
  const value = d.query.value;
  const unit = value.unit ? ` ${value.unit}` : '';
  const { edges, counts } = d.bins;
  const edgeFmt = valueFormatter([d.bins.width, ...edges], labelStyle(value));
  const top = counts.indexOf(max(counts) ?? 0);
  const what = `Histogram of ${inSentence(value.label)}, ${count(d.n, 'value')} in ${count(counts.length, 'bin')} of ${edgeFmt(d.bins.width)}${unit} from ${edgeFmt(edges[0]!)} to ${edgeFmt(edges[edges.length - 1]!)}${unit}`;
  const centre = d.stats ? `${centreAndSpread(d.stats, statsFormatter([d.stats], labelStyle(value)), unit)}; ` : '';
  return { what, reading: `${centre}the fullest bin, ${edgeFmt(edges[top]!)} to ${edgeFmt(edges[top + 1]!)}, holds ${count(counts[top]!, 'value')}` };
}

/** Box plot or strip chart: each group's centre and spread when there are few, else the highest and lowest medians and the widest spread. */
export function groupsAlt(d: DerivedGroups, noun: string): AltText {
  const { key, value } = d.query;
  const unit = value.unit ? ` ${value.unit}` : '';
  const fmt = statsFormatter(d.groups.map((g) => g.stats), labelStyle(value));
  const what = `${noun} of ${inSentence(value.label)} by ${inSentence(key.label)}, ${count(d.groups.length, 'group')}, ${count(d.n, 'value')}`;
  if (d.groups.length === 1) return { what, reading: centreAndSpread(d.groups[0]!.stats, fmt, unit) };
  const byMedian = [...d.groups].sort((a, b) => b.stats.median - a.stats.median);
  const [top, low] = [byMedian[0]!, byMedian[byMedian.length - 1]!];
  const iqr = (g: (typeof d.groups)[number]) => g.stats.q3 - g.stats.q1;
  const widest = d.groups.reduce((a, b) => (iqr(b) > iqr(a) ? b : a));
  return {
    what,
    reading: `highest median ${top.label} (${centreAndSpread(top.stats, fmt, unit)}), lowest median ${low.label} (${centreAndSpread(low.stats, fmt, unit)}); the widest middle half is ${widest.label}'s (IQR ${fmt(iqr(widest))}${unit})`,
  };
}
