import { fsum } from 'd3-array';
import type { DerivedStream } from '../derive/stream.js';
import type { SlopeItem } from '../derive/slopes.js';
import type { Task } from '../derive/tasks.js';
import { inSentence } from '../fields/labels.js';
import { axisTitle } from '../layout/axis.js';
import { labelStyle, type NumberStyle, valueFormatter } from '../layout/number-format.js';
import { count, extremes, percentChange, someNames, type AltText } from './alt-words.js';
import { percentText } from './stack-text.js';

/** "North rose most, from 61 to 74 (+21%)": an item's move, with the percent where it means something. */
function move(item: SlopeItem, fmt: (n: number) => string): string {
  const pct = percentChange(item.before, item.after);
  return `${item.label} (from ${fmt(item.before)} to ${fmt(item.after)}${pct ? `, ${item.after > item.before ? '+' : '\u2212'}${pct}` : ''})`;
}

/** Slope chart: how many went up and down, the biggest riser and the biggest faller (by the change in value). */
export function slopeAlt(items: readonly SlopeItem[], ends: [string, string], itemLabel: string, valueTitle: string, format: NumberStyle | undefined): AltText {
  const fmt = valueFormatter(items.flatMap((i) => [i.before, i.after]), format);
  const up = items.filter((i) => i.after > i.before).length;
  const down = items.filter((i) => i.after < i.before).length;
  const what = `Slope chart of ${inSentence(valueTitle)} for ${count(items.length, 'item')} (${inSentence(itemLabel)}) from ${ends[0]} to ${ends[1]}`;
  const e = extremes(items.map((i) => ({ label: i.label, value: i.after - i.before })));
  // Items tied for the biggest change are all named.
  const tied = (change: number) => items.filter((i) => i.after - i.before === change).map((i) => move(i, fmt));
  const named = (noun: string, change: number) => { const t = tied(change); return t.length === 1 ? `the biggest ${noun} is ${t[0]}` : `the biggest ${noun}s, tied, are ${someNames(t)}`; };
  const parts = [`${up} went up, ${down} went down, ${items.length - up - down} stayed the same`];
  if (e && e.top.value > 0) parts.push(named('riser', e.top.value));
  if (e && e.low.value < 0) parts.push(named('faller', e.low.value));
  return { what, reading: parts.join('; ') };
}

/** Streamgraph: the strongest layer in total, its share of all, and the key where the whole stream is thickest. */
export function streamAlt(d: DerivedStream): AltText {
  const { time, series, value } = d.query;
  const valueTitle = axisTitle(value, value.label);
  const [first, last] = [d.keys[0]!.label, d.keys[d.keys.length - 1]!.label];
  const what = `Streamgraph of ${inSentence(valueTitle)} for ${count(d.layers.length, 'series', 'series')} of ${inSentence(series.label)} over ${inSentence(time.label)}, from ${first} to ${last}`;
  const totals = d.layers.map((l) => ({ label: l.name, value: fsum(l.values) }));
  const all = fsum(totals, (t) => t.value);
  const top = extremes(totals)?.top;
  const thickness = d.keys.map((k, i) => ({ label: k.label, value: fsum(d.layers, (l) => l.values[i] ?? 0) }));
  const thickest = extremes(thickness)?.top;
  const fmt = valueFormatter(thickness.map((t) => t.value), labelStyle(value));
  const reading = [top && `the strongest in total is ${top.label} (${percentText(all ? top.value / all : 0)} of all)`, thickest && `the stream is thickest at ${thickest.label} (${fmt(thickest.value)} in all)`].filter(Boolean).join('; ');
  return { what, reading };
}

/** Length of a task, in days for calendar times (ms) or in the time's own units. */
function lengthOf(t: Task, calendar: boolean): number {
  return calendar ? (t.end - t.start) / 86_400_000 : t.end - t.start;
}

/** The chain of predecessors ending at a task (first to last), following each task's `after`; stops at a loop. */
function chainTo(last: Task, byName: ReadonlyMap<string, Task>): Task[] {
  const chain = [last];
  const seen = new Set([last.label]);
  for (let t = last; t.after !== undefined && byName.has(t.after) && !seen.has(t.after);) {
    t = byName.get(t.after)!;
    seen.add(t.label);
    chain.unshift(t);
  }
  return chain;
}

/** "A → B → C", the middle left out past six names. */
function chainNames(names: readonly string[]): string {
  return (names.length <= 6 ? names : [...names.slice(0, 3), '…', ...names.slice(-2)]).join(' \u2192 ');
}

/** Gantt chart: the whole span, the longest task, and the chain of dependencies that ends last (the critical path when tasks start as soon as their predecessors end). */
export function ganttAlt(tasks: readonly Task[], dependencies: number, calendar: boolean, timeText: (t: number) => string): AltText {
  const first = tasks.reduce((a, b) => (b.start < a.start ? b : a));
  const last = tasks.reduce((a, b) => (b.end > a.end ? b : a));
  // Under a day, in hours (a task of two hours never reads "0 days").
  const days = (n: number) => (!calendar ? valueFormatter([n])(n) : n >= 1 ? count(Math.round(n * 10) / 10, 'day') : count(Math.round(n * 240) / 10, 'hour'));
  const span = lengthOf({ ...first, end: last.end }, calendar);
  const what = `Gantt chart of ${count(tasks.length, 'task')}${dependencies ? `, with ${count(dependencies, 'dependency', 'dependencies')}` : ''}, from ${timeText(first.start)} (${first.label}) to ${timeText(last.end)} (${last.label}), ${days(span)} in all`;
  const longest = tasks.reduce((a, b) => (lengthOf(b, calendar) > lengthOf(a, calendar) ? b : a));
  const chain = chainTo(last, new Map(tasks.map((t) => [t.label, t])));
  const critical = chain.length > 1 ? `; the chain of dependencies that ends last runs through ${count(chain.length, 'task')}: ${chainNames(chain.map((t) => t.label))}` : '';
  return { what, reading: `the longest task is ${longest.label} (${days(lengthOf(longest, calendar))})${critical}` };
}
