import { numberFormatIn } from '../layout/number-format.js';
import { capText } from '../layout/text.js';
import { summaryOf, type BarQuery, type DerivedBars, type FoldSummary } from '../derive/bars.js';
import { axisTitle } from '../layout/axis.js';
import { inSentence } from '../fields/labels.js';
import { combinedTitle, combineNote } from './combining.js';

/** The value axis title of a bar chart. */
export function barValueTitle(query: BarQuery): string {
  const { value, aggregate } = query;
  if (!value) return 'Number of rows';
  return combinedTitle(axisTitle(value, value.label), aggregate, query.combined);
}

const NO_DATA_NAMES = 6;

/** The notes of a bar chart: rows combined, keys with no data, and what a fold left out, in that order. */
export function barNotes(query: BarQuery, fold: FoldSummary | undefined, valueTitle: string, fmt: (n: number) => string): string[] {
  return [...combineNote(query.key, query.value, query.aggregate, query.combined), ...noDataNote(query), ...foldNote(query, fold, valueTitle, fmt)];
}

/** "No data: A, B." naming the keys that have no value, shortened to a count beyond a few names. */
export function noDataNote(query: Pick<BarQuery, 'key' | 'noData'>): string[] {
  const names = query.noData ?? [];
  if (names.length === 0) return [];
  const shown = names.slice(0, NO_DATA_NAMES).map((n) => capText(n, 40));
  const more = names.length - shown.length;
  return [`No data: ${shown.join(', ')}${more > 0 ? ` and ${more} more ${inSentence(query.key.label)} values` : ''}.`];
}

/** The note printed under a folded chart, saying what "Others" holds or what was left out. */
export function foldNote(query: BarQuery, fold: FoldSummary | undefined, valueTitle: string, fmt: (n: number) => string): string[] {
  if (!fold) return [];
  const n = numberFormatIn(query.key.locale, ',d')(fold.count);
  const key = inSentence(query.key.label);
  const value = inSentence(valueTitle);
  // With negative values, the keys folded are those closest to zero, not the smallest.
  const which = fold.nearZero ? `${value} closest to zero` : `smallest ${value}`;
  if (fold.mode === 'others') return [`"Others (${n})" is the total of the ${n} ${key} values with the ${which}.`];
  if (fold.mode === 'stated') return [`Not drawn: the ${n} ${key} values with the ${which}, together ${fmt(fold.total ?? 0)}, more in size than any bar shown.`];
  if (fold.mode === 'dropped') return [`The ${n} ${key} values with the ${which} are not shown.`];
  if (fold.mode === 'mixed') return [`Not drawn: the ${n} ${key} values with the ${which}, from ${fmt(fold.range![0])} to ${fmt(fold.range![1])}; their positive and negative values are not netted into one bar.`];
  return [];
}

/** What a derived bar chart folded, as the note states it; undefined when nothing was. */
export function foldOf(derived: DerivedBars): FoldSummary | undefined {
  return derived.foldMode === 'none' ? undefined : summaryOf(derived, derived.anyNegative);
}

/** One sentence for screen readers: what is compared, how many bars, and the extremes. */
export function barDescription(derived: DerivedBars, valueTitle: string, fmt: (n: number) => string): string {
  const bars = derived.bars.filter((b) => b.folds === undefined);
  const count = `${derived.bars.length} bar${derived.bars.length === 1 ? '' : 's'}`;
  const what = `Bar chart of ${inSentence(valueTitle)} by ${inSentence(derived.query.key.label)}, ${count}`;
  if (bars.length === 0) return `${what}.`;
  const top = bars.reduce((a, b) => (b.value > a.value ? b : a));
  const low = bars.reduce((a, b) => (b.value < a.value ? b : a));
  if (top === low) return `${what}: ${top.label} ${fmt(top.value)}.`;
  return `${what}: largest ${top.label} (${fmt(top.value)}), smallest ${low.label} (${fmt(low.value)}).`;
}

/** A mark's tooltip from (label, text) pairs: "Pier: North, Crossings (per day): 212". */
export function tooltipText(pairs: ReadonlyArray<readonly [string, string]>): string {
  return pairs.map(([label, text]) => `${label}: ${text}`).join(', ');
}
