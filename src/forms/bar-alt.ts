import { fsum } from 'd3-array';
import type { DerivedBars } from '../derive/bars.js';
import { inSentence } from '../fields/labels.js';
import { labelStyle, type NumberStyle, valueFormatter } from '../layout/number-format.js';
import type { DataTable } from '../scene/types.js';
import { count, extremes, extremesReading, type AltText } from './alt-words.js';
import { barValueTitle } from './bar-text.js';
import type { BarPlan } from './bar-plan.js';
import { percentText, stackValueTitle, type StackDerived } from './stack-text.js';

/** The bars a reading names: never the folded "Others" bar, which is no key of its own. */
function ownBars(derived: DerivedBars) {
  return derived.bars.filter((b) => b.folds === undefined);
}

/** Bar chart: largest and smallest bar, with values as the bar labels write them. */
export function barAlt(derived: DerivedBars<BarPlan>): AltText {
  const valueTitle = barValueTitle(derived.query);
  const fmt = valueFormatter(derived.bars.map((b) => b.value), derived.query.value);
  const n = derived.bars.length;
  return { what: `Bar chart of ${inSentence(valueTitle)} by ${inSentence(derived.query.key.label)}, ${count(n, 'bar')}`, reading: extremesReading(ownBars(derived), fmt) };
}

/** Radial bar chart: the cycle's peak and trough, in cycle order. */
export function radialBarAlt(derived: DerivedBars): AltText {
  const valueTitle = barValueTitle(derived.query);
  const fmt = valueFormatter(derived.bars.map((b) => b.value), labelStyle(derived.query.value));
  const what = `Radial bar chart of ${inSentence(valueTitle)} by ${inSentence(derived.query.key.label)}, ${count(derived.bars.length, 'bar')} around a circle in cycle order`;
  return { what, reading: extremesReading(derived.bars, fmt, ['peak at', 'lowest at']) };
}

/** Bars of shares of one whole (normalized bars of one key, donut): the largest and smallest share, as the chart writes percents. */
export function shareAlt(derived: DerivedBars, noun: string): AltText {
  const bars = ownBars(derived);
  const name = inSentence(derived.query.key.label);
  const what = `${noun} of the ${count(derived.bars.length, 'part')} of the whole by ${name}`;
  return { what, reading: extremesReading(bars, percentText, ['largest part', 'smallest']) };
}

/** A grouped bar: one key's value in one group. */
interface GroupedBarLike { key: string; group: string; value: number }

/** Grouped bar chart: the largest and smallest bar, each named by key and group. */
export function groupedBarAlt(bars: readonly GroupedBarLike[], what: string, format: NumberStyle | undefined): AltText {
  const fmt = valueFormatter(bars.map((b) => b.value), format);
  return { what, reading: extremesReading(bars.map((b) => ({ label: `${b.key}, ${b.group}`, value: b.value })), fmt) };
}

/** Stacked or normalized bar chart: the strongest part overall and the largest bar (or, normalized, where the strongest part's share is greatest). */
export function stackAlt(derived: StackDerived): AltText {
  const { stacks, parts, query } = derived;
  const kind = query.normalized ? 'Normalized stacked bar chart' : 'Stacked bar chart';
  const what = `${kind} of ${inSentence(stackValueTitle(derived))} by ${inSentence(query.group.label)} and ${inSentence(query.part.label)}, ${count(stacks.length, 'bar')} of ${count(parts.length, 'part')}`;
  const totals = parts.map((part) => ({ label: part, value: fsum(stacks, (s) => s.segments.find((g) => g.part === part)?.value ?? 0) }));
  const strongest = extremes(totals)?.top;
  if (!strongest) return { what, reading: '' };
  const all = fsum(stacks, (s) => s.total);
  const shareOf = (s: (typeof stacks)[number]) => s.segments.find((g) => g.part === strongest.label)?.share ?? 0;
  if (query.normalized) {
    const most = stacks.reduce((a, b) => (shareOf(b) > shareOf(a) ? b : a));
    return { what, reading: `the largest part overall is ${strongest.label} (${percentText(all ? strongest.value / all : 0)} of all), its share greatest in ${most.group} (${percentText(shareOf(most))})` };
  }
  const fmt = valueFormatter([...stacks.map((s) => s.total), strongest.value], labelStyle(query.value));
  const bars = extremesReading(stacks.map((s) => ({ label: s.group, value: s.total })), fmt, ['largest total', 'smallest']);
  return { what, reading: `the largest part overall is ${strongest.label} (${fmt(strongest.value)}, ${percentText(all ? strongest.value / all : 0)} of all); ${bars}` };
}

/**
 * The bars drawn as a table: key, value as drawn (after combining and folding), how many source
 * rows each bar combines (`rows_combined`), and for the folded "Others" bar how many keys it holds
 * (`folded_keys`, a column only when a bar folds).
 */
export function barData(derived: DerivedBars): DataTable {
  const key = derived.query.key.name;
  const value = derived.valueName;
  const folds = derived.bars.some((b) => b.folds !== undefined);
  const columns = [key, value, 'rows_combined', ...(folds ? ['folded_keys'] : [])];
  const rows = derived.bars.map((b) => ({ [key]: b.label, [value]: b.value, rows_combined: b.count, ...(folds ? { folded_keys: b.folds ?? null } : {}) }));
  return { columns, rows };
}
