import { format } from 'd3-format';
import type { BarQuery, DerivedBars, FoldSummary } from '../derive/bars.js';
import { axisTitle } from '../layout/axis.js';

/** The value axis title of a bar chart. */
export function barValueTitle(query: BarQuery): string {
  const { value, aggregate } = query;
  if (!value) return 'Number of rows';
  const title = axisTitle(value, value.label);
  return aggregate === 'mean' ? `Mean ${title.charAt(0).toLowerCase()}${title.slice(1)}` : title;
}

/** The note printed under a folded chart, saying what "Others" holds or what was left out. */
export function foldNote(query: BarQuery, fold: FoldSummary | undefined, valueTitle: string, fmt: (n: number) => string): string[] {
  if (!fold) return [];
  const n = format(',d')(fold.count);
  const key = query.key.label.toLowerCase();
  const value = valueTitle.toLowerCase();
  if (fold.mode === 'others') return [`"Others (${n})" is the total of the ${n} ${key} values with the smallest ${value}.`];
  if (fold.mode === 'stated') return [`Not drawn: the ${n} ${key} values with the smallest ${value}, together ${fmt(fold.total ?? 0)}, more than any bar shown.`];
  if (fold.mode === 'dropped') return [`The ${n} ${key} values with the smallest ${value} are not shown.`];
  return [];
}

/** What a derived bar chart folded, as the note states it; undefined when nothing was. */
export function foldOf(derived: DerivedBars): FoldSummary | undefined {
  return derived.foldMode === 'none' ? undefined : { mode: derived.foldMode, count: derived.foldedKeys.length, total: derived.foldedTotal };
}

/** One sentence for screen readers: what is compared, how many bars, and the extremes. */
export function barDescription(derived: DerivedBars, valueTitle: string, fmt: (n: number) => string): string {
  const bars = derived.bars.filter((b) => b.folds === undefined);
  const count = `${derived.bars.length} bar${derived.bars.length === 1 ? '' : 's'}`;
  const what = `Bar chart of ${valueTitle.toLowerCase()} by ${derived.query.key.label.toLowerCase()}, ${count}`;
  if (bars.length === 0) return `${what}.`;
  const top = bars.reduce((a, b) => (b.value > a.value ? b : a));
  const low = bars.reduce((a, b) => (b.value < a.value ? b : a));
  if (top === low) return `${what}: ${top.label} ${fmt(top.value)}.`;
  return `${what}: largest ${top.label} (${fmt(top.value)}), smallest ${low.label} (${fmt(low.value)}).`;
}
