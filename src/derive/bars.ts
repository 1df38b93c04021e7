import type { BarPlan } from '../choose/types.js';
import { describeRows, diagnostic, failure, success, type Diagnostic, type Outcome } from '../diagnostics/diagnostic.js';
import { keyText } from '../fields/labels.js';
import type { Table } from '../table/types.js';
import { AGGREGATE_VERB, aggregateValues } from './aggregate.js';
import { firstUnevenStep } from './dates.js';
import { compareNatural, compareText } from './order.js';

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

/** The numbers a bar chart draws. */
export interface DerivedBars {
  plan: BarPlan;
  bars: BarDatum[];
  /** Name of the value in data terms: the value column, or "count". */
  valueName: string;
  /** The keys folded into "Others", largest first. */
  foldedKeys: string[];
  /**
   * How folded keys were combined: into an "Others" bar; left out (mean, min, max cannot be
   * added); or left out with their total stated, because an "Others" bar longer than every
   * bar shown would squash the bars the chart is for.
   */
  foldMode: 'others' | 'dropped' | 'stated' | 'none';
  /** The total of the folded keys, for "others" and "stated". */
  foldedTotal?: number;
}

interface Group { label: string; sortKey: number; values: number[]; rows: number[] }

/** Where a row's key sits in the key's own order: time, number, or level index (levels looked up by Map, not indexOf). */
function keyOrderOf(plan: BarPlan): (row: number) => number {
  const { column, levels } = plan.key;
  const index = new Map(levels.map((level, i) => [level, i]));
  return (row) => {
    const v = column.values[row];
    if (typeof v === 'number') return v;
    return index.get(column.text[row] ?? '') ?? Number.MAX_SAFE_INTEGER;
  };
}

function groupRows(table: Table, plan: BarPlan, problems: Diagnostic[]): Group[] {
  const groups = new Map<string, Group>();
  const missingValue: number[] = [];
  const missingKey: number[] = [];
  const keyOrder = keyOrderOf(plan);
  for (let i = 0; i < table.rowCount; i++) {
    const label = keyText(plan.key.column, i);
    const raw = plan.value ? plan.value.column.values[i] : 1;
    if (label === null) { missingKey.push(table.rowPositions[i]!); continue; }
    if (typeof raw !== 'number') { missingValue.push(table.rowPositions[i]!); continue; }
    let g = groups.get(label);
    if (!g) { g = { label, sortKey: keyOrder(i), values: [], rows: [] }; groups.set(label, g); }
    g.values.push(raw);
    g.rows.push(table.rowPositions[i]!);
  }
  const noun = table.positionNoun;
  if (missingValue.length) {
    problems.push(diagnostic('derive.missing-values', `${describeRows(missingValue, noun)} ha${missingValue.length === 1 ? 's' : 've'} no usable \`${plan.value!.name}\` (missing or not finite) and ${missingValue.length === 1 ? 'is' : 'are'} left out, not drawn as zero`, {
      file: table.origin.file, field: plan.value!.name, rows: missingValue, hint: 'fill in the values, or remove those rows if they are not data',
    }));
  }
  if (missingKey.length) {
    problems.push(diagnostic('derive.missing-values', `${describeRows(missingKey, noun)} ha${missingKey.length === 1 ? 's' : 've'} no \`${plan.key.name}\` and ${missingKey.length === 1 ? 'is' : 'are'} left out`, {
      file: table.origin.file, field: plan.key.name, rows: missingKey, hint: 'give every row a key',
    }));
  }
  return [...groups.values()];
}

function sortBars(bars: BarDatum[], keyOf: Map<string, number>, order: BarPlan['order']): BarDatum[] {
  const byValue = (a: BarDatum, b: BarDatum) => b.value - a.value || compareText(a.label, b.label);
  if (order === 'value') return [...bars].sort(byValue);
  if (order === 'label') return [...bars].sort((a, b) => compareNatural(a.label, b.label));
  if (order === 'key') return [...bars].sort((a, b) => keyOf.get(a.label)! - keyOf.get(b.label)! || compareText(a.label, b.label));
  return bars;
}

function fold(bars: BarDatum[], plan: BarPlan, valueName: string, problems: Diagnostic[]): Pick<DerivedBars, 'bars' | 'foldedKeys' | 'foldMode' | 'foldedTotal'> | undefined {
  if (bars.length <= plan.capacity) return { bars, foldedKeys: [], foldMode: 'none' };
  if (plan.order === 'key') {
    problems.push(diagnostic('derive.too-many-ordered-bars', `${bars.length} bars in key order do not fit: the plot holds ${plan.capacity} at 3 px each, and folding an ordered key into "Others" would break its order`, {
      field: plan.key.name, found: `${bars.length} bars`, expected: `at most ${plan.capacity}`, hint: 'use intent: trend for a line, aggregate to a coarser key (e.g. months instead of days), or make the chart larger with `size:`',
    }));
    return undefined;
  }
  const additive = plan.aggregate === 'sum' || plan.aggregate === 'count';
  const ranked = [...bars].sort((a, b) => b.value - a.value || compareText(a.label, b.label));
  const restTotal = (keep: number) => ranked.slice(keep).reduce((s, b) => s + b.value, 0);
  const largestShown = (keep: number) => Math.max(...ranked.slice(0, keep).map((b) => Math.abs(b.value)));
  // An "Others" bar longer than every bar kept would squash them all on the shared scale.
  const stated = additive && Math.abs(restTotal(plan.capacity - 1)) > largestShown(plan.capacity - 1);
  const keep = additive && !stated ? plan.capacity - 1 : plan.capacity;
  const kept = new Set(ranked.slice(0, keep).map((b) => b.label));
  const rest = ranked.slice(keep);
  const total = restTotal(keep);
  const shown = bars.filter((b) => kept.has(b.label));
  const mode: DerivedBars['foldMode'] = !additive ? 'dropped' : stated ? 'stated' : 'others';
  if (mode === 'others') {
    shown.push({ label: `Others (${rest.length})`, value: total, count: rest.reduce((s, b) => s + b.count, 0), rows: rest.flatMap((b) => b.rows), folds: rest.length });
  }
  const why = {
    others: `the ${rest.length} smallest are folded into one "Others" bar carrying their total ${valueName}`,
    stated: `the ${rest.length} smallest are left out and their total ${valueName} is stated in a note, because an "Others" bar of it would be longer than every bar shown and squash them`,
    dropped: `the ${rest.length} smallest are left out, because ${plan.aggregate} values cannot be added into an "Others" bar`,
  }[mode];
  problems.push(diagnostic('derive.others-folded', `${bars.length} bars do not fit at 3 px each; ${why}`, {
    field: plan.key.name, found: `${bars.length} bars`, expected: `at most ${plan.capacity}`, hint: 'make the chart larger with `size:`, or filter the table to the keys that matter',
  }));
  return { bars: shown, foldedKeys: rest.map((b) => b.label), foldMode: mode, ...(additive ? { foldedTotal: total } : {}) };
}

const GRAIN_WORD = { year: 'years', month: 'months', day: 'days', minute: 'ms', second: 'ms' } as const;

/**
 * Bars stand evenly apart, so a date key with gaps (a missing month) would look like one step:
 * warned about, naming the first gap.
 */
function unevenDates(bars: BarDatum[], keyOf: Map<string, number>, plan: BarPlan): Diagnostic[] {
  const { column } = plan.key;
  if (plan.key.type !== 'temporal' || plan.order !== 'key' || column.type !== 'date') return [];
  const grain = column.grain ?? 'day';
  const gap = firstUnevenStep(bars.map((b) => keyOf.get(b.label)!), grain);
  if (!gap) return [];
  const after = bars.find((b) => keyOf.get(b.label) === gap.after)!.label;
  return [diagnostic('derive.uneven-dates', `the dates of \`${plan.key.name}\` are not evenly spaced: after ${after} comes a step of ${gap.step} ${GRAIN_WORD[grain]} where the others are ${gap.usual}; bars stand evenly apart, so the gap does not show`, {
    field: plan.key.name, hint: 'add rows for the missing dates (NA leaves a visible empty slot), or chart time to scale with a line (intent: trend)',
  })];
}

/**
 * The derive stage for bars: rows → one bar per key, combined by the brief's aggregate, in the
 * chosen order, folded to what the plot can show. Missing values are left out, never drawn as 0.
 */
export function deriveBars(table: Table, plan: BarPlan): Outcome<DerivedBars> {
  const problems: Diagnostic[] = [];
  const groups = groupRows(table, plan, problems);
  const valueName = plan.value?.name ?? 'count';
  if (groups.length === 0) {
    problems.push(diagnostic('derive.no-rows', 'no row has both a key and a usable value, so there is nothing to draw', {
      file: table.origin.file, hint: 'check that the key and value columns are the ones you meant', expected: 'at least one complete row',
    }));
    return failure(problems);
  }
  const combined = groups.filter((g) => g.values.length > 1);
  if (combined.length && plan.value) {
    problems.push(diagnostic('derive.aggregated', `${combined.length} key${combined.length === 1 ? '' : 's'} ha${combined.length === 1 ? 's' : 've'} several rows (first: ${JSON.stringify(combined[0]!.label)}, ${combined[0]!.values.length} rows); their values are ${AGGREGATE_VERB[plan.aggregate]} (aggregate: ${plan.aggregate})`, {
      field: plan.key.name, hint: 'set `aggregate:` to sum, mean, count, max or min',
    }));
  }
  const bars = groups.map((g) => ({ label: g.label, value: aggregateValues(g.values, plan.aggregate), count: g.values.length, rows: g.rows }));
  const keyOf = new Map(groups.map((g) => [g.label, g.sortKey]));
  const sorted = sortBars(bars, keyOf, plan.order);
  problems.push(...unevenDates(sorted, keyOf, plan));
  const folded = fold(sorted, plan, valueName, problems);
  if (!folded) return failure(problems);
  return success({ plan, valueName, ...folded }, problems);
}
