import { format } from 'd3-format';
import type { DerivedBars } from '../derive/bars.js';
import { axisTitle } from '../layout/axis.js';

/** The value axis title of a bar chart. */
export function barValueTitle(derived: DerivedBars): string {
  const { value, aggregate } = derived.plan;
  if (!value) return 'Number of rows';
  const title = axisTitle(value, value.label);
  return aggregate === 'mean' ? `Mean ${title.charAt(0).toLowerCase()}${title.slice(1)}` : title;
}

/** The note printed under a folded chart, saying what "Others" holds or what was left out. */
export function foldNote(derived: DerivedBars, valueTitle: string, fmt: (n: number) => string): string[] {
  const n = format(',d')(derived.foldedKeys.length);
  const key = derived.plan.key.label.toLowerCase();
  const value = valueTitle.toLowerCase();
  if (derived.foldMode === 'others') return [`"Others (${n})" is the total of the ${n} ${key} values with the smallest ${value}.`];
  if (derived.foldMode === 'stated') return [`Not drawn: the ${n} ${key} values with the smallest ${value}, together ${fmt(derived.foldedTotal ?? 0)}, more than any bar shown.`];
  if (derived.foldMode === 'dropped') return [`The ${n} ${key} values with the smallest ${value} are not shown.`];
  return [];
}

/** One sentence for screen readers: what is compared, how many bars, and the extremes. */
export function barDescription(derived: DerivedBars, valueTitle: string, fmt: (n: number) => string): string {
  const bars = derived.bars.filter((b) => b.folds === undefined);
  const count = `${derived.bars.length} bar${derived.bars.length === 1 ? '' : 's'}`;
  const what = `Bar chart of ${valueTitle.toLowerCase()} by ${derived.plan.key.label.toLowerCase()}, ${count}`;
  if (bars.length === 0) return `${what}.`;
  const top = bars.reduce((a, b) => (b.value > a.value ? b : a));
  const low = bars.reduce((a, b) => (b.value < a.value ? b : a));
  if (top === low) return `${what}: ${top.label} ${fmt(top.value)}.`;
  return `${what}: largest ${top.label} (${fmt(top.value)}), smallest ${low.label} (${fmt(low.value)}).`;
}
