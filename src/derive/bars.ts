import { extent, fsum } from 'd3-array';
import type { Aggregate } from '../brief/types.js';
import { diagnostic, failure, success, type Diagnostic, type Outcome } from '../diagnostics/diagnostic.js';
import type { FieldRef } from '../fields/types.js';
import type { Table } from '../table/types.js';
import { AGGREGATORS } from './aggregate.js';
import { firstUnevenStep } from './dates.js';
import { groupRows, type Grouped, type RowGroup } from './group.js';
import type { Combined } from './group.js';
import { compareNatural, compareText } from './order.js';
import { agree, count } from '../diagnostics/words.js';

/** What the bar derivation needs from the plan. */
export interface BarQuery {
  key: FieldRef;
  /** The value field; undefined when bars count rows (`aggregate: count` with no value). */
  value: FieldRef | undefined;
  /** value: largest first; label: A→Z; data: as the rows give them; key: the key's own order. */
  order: 'value' | 'label' | 'data' | 'key';
  aggregate: Aggregate;
  /** Whether the brief stated the aggregate; when not, the plan has already warned about combined rows. Default: stated. */
  aggregateStated?: boolean;
  /** Rows sharing a key that are combined, as the plan found them. Default: none. */
  combined?: Combined;
  /** Keys with no usable value in any row. Default: none. */
  noData?: string[];
}

/** One bar: its label, the value it shows, and the rows behind it. */
export interface BarDatum {
  label: string;
  value: number;
  /** Rows combined into this bar. */
  count: number;
  /** Source positions of those rows. */
  rows: number[];
  /** For the "Others" bar: how many keys it folds together. */
  folds?: number;
}

/**
 * How folded keys were combined: into an "Others" bar; left out (mean, min, max cannot be
 * added); or left out with their total stated, because an "Others" bar longer than every bar
 * shown would squash the bars the chart is for; or, when what is left out mixes positive and
 * negative values ('mixed'), left out with their range stated, since one bar of their net sum
 * would hide both.
 */
export type FoldMode = 'others' | 'dropped' | 'stated' | 'mixed' | 'none';

/** What a fold left out, as the note under the chart states it. */
export interface FoldSummary {
  mode: FoldMode;
  /** How many keys were folded. */
  count: number;
  /** Their total, for "others" and "stated". */
  total?: number;
  /** Their smallest and largest value, for "mixed". */
  range?: [number, number];
  /** Whether the chart has negative values, so "smallest" would mislead: folded keys are those closest to zero. */
  nearZero: boolean;
}

/** The numbers a bar chart draws, with the query (or the plan holding it) they came from. */
export interface DerivedBars<Q extends BarQuery = BarQuery> {
  query: Q;
  bars: BarDatum[];
  /** Name of the value in data terms: the value column, or "count". */
  valueName: string;
  /** The keys folded into "Others" or left out, largest first. */
  foldedKeys: string[];
  foldMode: FoldMode;
  /** The total of the folded keys, for "others" and "stated". */
  foldedTotal?: number;
  /** The smallest and largest folded value, for "mixed". */
  foldedRange?: [number, number];
  /** Whether any bar, shown or folded, is negative (then folded keys are "closest to zero"). */
  anyNegative: boolean;
  /** How many bars the plot holds at the narrowest band drawn. */
  capacity: number;
}

/**
 * How many bars the plot holds, given what a fold would leave out (its note takes room from the
 * plot). Supplied by the bar form, which measures the frame; a plain number in tests.
 */
export type CapacityFor = (fold: FoldSummary | undefined, bars: readonly BarDatum[]) => number;

/** Bars in the query's order: by value (largest first, ties by label), by label, in key order, or as the data gives them. */
export function sortBars(bars: BarDatum[], keyOf: Map<string, number>, order: BarQuery['order']): BarDatum[] {
  const byValue = (a: BarDatum, b: BarDatum) => b.value - a.value || compareText(a.label, b.label);
  if (order === 'value') return [...bars].sort(byValue);
  if (order === 'label') return [...bars].sort((a, b) => compareNatural(a.label, b.label));
  if (order === 'key') return [...bars].sort((a, b) => keyOf.get(a.label)! - keyOf.get(b.label)! || compareText(a.label, b.label));
  return bars;
}

type Folded = Pick<DerivedBars, 'bars' | 'foldedKeys' | 'foldMode' | 'foldedTotal' | 'foldedRange'>;

/** Keys left out, with positive and negative values mixed: their range is stated, not a net sum that would hide both. */
function foldMixed(bars: BarDatum[], ranked: BarDatum[], capacity: number): Folded | undefined {
  const rest = ranked.slice(capacity);
  if (!rest.some((b) => b.value > 0) || !rest.some((b) => b.value < 0)) return undefined;
  const kept = new Set(ranked.slice(0, capacity).map((b) => b.label));
  const values = rest.map((b) => b.value);
  const [lo, hi] = extent(values) as [number, number];
  return { bars: bars.filter((b) => kept.has(b.label)), foldedKeys: rest.map((b) => b.label), foldMode: 'mixed', foldedRange: [lo, hi] };
}

/**
 * The bars kept at a capacity: those farthest from zero (so large negative values are never the
 * ones folded away), plus an "Others" bar, or with the rest stated, dropped or (mixed signs) ranged.
 */
function foldAt(bars: BarDatum[], query: BarQuery, capacity: number): Folded {
  const { additive } = AGGREGATORS[query.aggregate];
  const ranked = [...bars].sort((a, b) => Math.abs(b.value) - Math.abs(a.value) || compareText(a.label, b.label));
  const mixed = additive ? foldMixed(bars, ranked, capacity) : undefined;
  if (mixed) return mixed;
  const restTotal = (keep: number) => fsum(ranked.slice(keep), (b) => b.value);
  const largestShown = (keep: number) => Math.max(...ranked.slice(0, keep).map((b) => Math.abs(b.value)));
  // An "Others" bar longer than every bar kept would squash them all on the shared scale.
  const stated = additive && Math.abs(restTotal(capacity - 1)) > largestShown(capacity - 1);
  const keep = additive && !stated ? capacity - 1 : capacity;
  const kept = new Set(ranked.slice(0, keep).map((b) => b.label));
  const rest = ranked.slice(keep);
  const total = restTotal(keep);
  const shown = bars.filter((b) => kept.has(b.label));
  const mode: FoldMode = !additive ? 'dropped' : stated ? 'stated' : 'others';
  if (mode === 'others') {
    shown.push({ label: `Others (${rest.length})`, value: total, count: rest.reduce((s, b) => s + b.count, 0), rows: rest.flatMap((b) => b.rows), folds: rest.length });
  }
  return { bars: shown, foldedKeys: rest.map((b) => b.label), foldMode: mode, ...(additive ? { foldedTotal: total } : {}) };
}

/**
 * The largest capacity the plot keeps once the fold's own note takes its room: each try folds at
 * the capacity found so far, measures again with that fold's note, and stops when the note fits.
 */
function settleCapacity(bars: BarDatum[], query: BarQuery, capacityFor: CapacityFor): { capacity: number; folded: Folded } {
  let capacity = Math.max(1, capacityFor(undefined, bars));
  for (;;) {
    const folded = foldAt(bars, query, capacity);
    const room = Math.max(1, capacityFor(summaryOf(folded, bars.some((b) => b.value < 0)), folded.bars));
    if (room >= capacity || capacity === 1) return { capacity, folded };
    capacity = room;
  }
}

/** What a fold left out, as its note states it. */
export function summaryOf(folded: Folded, anyNegative: boolean): FoldSummary {
  return { mode: folded.foldMode, count: folded.foldedKeys.length, total: folded.foldedTotal, range: folded.foldedRange, nearZero: anyNegative };
}

/** How the bars' room is measured, for the words of a fold: the least band a bar gets, and the frame that would hold them all. */
export interface BandNeed {
  /** Least band per bar, in px (3 for unnamed slots, a readable row for named bars). */
  px: number;
  /** Why that band: e.g. "so that each name reads". Default: none. */
  why?: string;
  /** The frame height that would show every bar, when the height is what limits them. */
  heightForAll?: (bars: number) => number;
}

function foldDiagnostic(total: number, query: BarQuery, folded: Folded, capacity: number, valueName: string, nearZero: boolean, need: BandNeed): Diagnostic {
  const n = folded.foldedKeys.length;
  const which = nearZero ? `${n} closest to zero` : `${n} smallest`;
  const why = {
    others: `the ${which} are folded into one "Others" bar carrying their total ${valueName}`,
    stated: `the ${which} are left out and their total ${valueName} is stated in a note, because an "Others" bar of it would be longer than every bar shown and squash them`,
    dropped: `the ${which} are left out, because ${query.aggregate} values cannot be added into an "Others" bar`,
    mixed: `the ${which} are left out and their range is stated in a note, because they mix positive and negative values that one "Others" bar would net out`,
    none: '',
  }[folded.foldMode];
  const all = need.heightForAll?.(total);
  const larger = all === undefined ? 'make the chart larger with `size:`' : `a height of ${all} px would name all ${total} (\`size: { height: ${all} }\`)`;
  return diagnostic('derive.others-folded', `${total} bars do not fit at ${need.px} px each${need.why ? ` ${need.why}` : ''}; ${why}`, {
    field: query.key.name, found: `${total} bars`, expected: `at most ${capacity}`, hint: `${larger}, or filter the table to the keys that matter`,
  });
}

const GRAIN_WORD = { year: 'years', month: 'months', day: 'days', minute: 'ms', second: 'ms' } as const;

/**
 * Bars stand evenly apart, so a date key with gaps (a missing month) would look like one step:
 * warned about, naming the first gap.
 */
function unevenDates(bars: BarDatum[], keyOf: Map<string, number>, query: BarQuery, table: Table): Diagnostic[] {
  const column = table.columns.find((c) => c.name === query.key.name)!;
  if (query.key.type !== 'temporal' || query.order !== 'key' || column.type !== 'date') return [];
  const grain = column.grain ?? 'day';
  const gap = firstUnevenStep(bars.map((b) => keyOf.get(b.label)!), grain);
  if (!gap) return [];
  const after = bars.find((b) => keyOf.get(b.label) === gap.after)!.label;
  return [diagnostic('derive.uneven-dates', `the dates of \`${query.key.name}\` are not evenly spaced: after ${after} comes a step of ${gap.step} ${GRAIN_WORD[gap.grain]} where the others are ${gap.usual}; bars stand evenly apart, so the gap does not show`, {
    field: query.key.name, hint: 'add rows for the missing dates (NA leaves a visible empty slot)',
  })];
}

/** Each group's rows combined by the query's aggregate into one bar; undefined (with a diagnostic) when a result is not finite. */
export function combineGroups(groups: RowGroup[], query: BarQuery, problems: Diagnostic[]): BarDatum[] | undefined {
  const aggregator = AGGREGATORS[query.aggregate];
  const combined = groups.filter((g) => g.values.length > 1);
  if (combined.length && query.value && query.aggregateStated !== false) {
    problems.push(diagnostic('derive.aggregated', `${count(combined.length, 'key')} ${agree(combined.length, 'has', 'have')} several rows (first: ${JSON.stringify(combined[0]!.labels[0])}, ${count(combined[0]!.values.length, 'row')}); their values are ${aggregator.verb} (aggregate: ${query.aggregate})`, {
      field: query.key.name, hint: 'set `aggregate:` to sum, mean, count, max or min',
    }));
  }
  const bars = groups.map((g) => ({ label: g.labels[0]!, value: aggregator.combine(g.values), count: g.values.length, rows: g.rows }));
  const overflow = bars.find((b) => !Number.isFinite(b.value));
  if (!overflow) return bars;
  problems.push(diagnostic('derive.not-finite', `the ${aggregator.verb} \`${query.value?.name ?? 'count'}\` of ${JSON.stringify(overflow.label)} is beyond the range of numbers (${overflow.value})`, {
    field: query.key.name, found: String(overflow.value), expected: 'a finite number (below about 1.8e308 in size)', hint: 'rescale the values (e.g. to thousands or millions) before charting',
  }));
  return undefined;
}

/**
 * The derive stage for bars: rows → one bar per key, combined by the aggregate, in the chosen
 * order, folded to what the plot can show. Missing values are left out, never drawn as 0.
 * `grouped` is the table's rows grouped by the query's key and value, when already at hand.
 */
export function deriveBars<Q extends BarQuery>(table: Table, query: Q, capacityFor: CapacityFor, grouped: Grouped = groupRows(table, { keys: [query.key], value: query.value }), need: BandNeed = { px: 3 }): Outcome<DerivedBars<Q>> {
  const { groups } = grouped;
  const problems = [...grouped.diagnostics];
  const valueName = query.value?.name ?? 'count';
  if (groups.length === 0) {
    problems.push(diagnostic('derive.no-rows', 'no row has both a key and a usable value, so there is nothing to draw', {
      file: table.origin.file, hint: 'check that the key and value columns are the ones you meant', expected: 'at least one complete row',
    }));
    return failure(problems);
  }
  const bars = combineGroups(groups, query, problems);
  if (!bars) return failure(problems);
  const keyOf = new Map(groups.map((g) => [g.labels[0]!, g.sortKeys[0]!]));
  const sorted = sortBars(bars, keyOf, query.order);
  problems.push(...unevenDates(sorted, keyOf, query, table));
  const fits = capacityFor(undefined, sorted);
  // A plot with no room at all is a frame too small for its words, which layout reports; folding
  // the bars to fit nothing would only add a misleading warning before that error.
  const anyNegative = sorted.some((b) => b.value < 0);
  if (sorted.length <= fits || fits < 1) return success({ query, valueName, bars: sorted, foldedKeys: [], foldMode: 'none', capacity: fits, anyNegative }, problems);
  if (query.order === 'key') {
    problems.push(diagnostic('derive.too-many-ordered-bars', `${sorted.length} bars in key order do not fit: the plot holds ${fits} at 3 px each, and folding an ordered key into "Others" would break its order`, {
      field: query.key.name, found: `${sorted.length} bars`, expected: `at most ${fits}`, hint: 'aggregate to a coarser key (e.g. months instead of days), or make the chart larger with `size:`',
    }));
    return failure(problems);
  }
  const { capacity, folded } = settleCapacity(sorted, query, capacityFor);
  problems.push(foldDiagnostic(sorted.length, query, folded, capacity, valueName, anyNegative, need));
  return success({ query, valueName, capacity, anyNegative, ...folded }, problems);
}
