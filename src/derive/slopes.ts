import type { Aggregate } from '../brief/types.js';
import { describeRows, diagnostic, failure, success, type Diagnostic, type Outcome } from '../diagnostics/diagnostic.js';
import type { FieldRef } from '../fields/types.js';
import type { Table } from '../table/types.js';
import { AGGREGATORS } from './aggregate.js';
import { groupRows, type RowGroup } from './group.js';
import { compareText } from './order.js';
import { agree, count } from '../diagnostics/words.js';

/** Which way an item moved between its two points. */
export type Direction = 'up' | 'down' | 'unchanged';

/** One item of a slope chart: its value at both points, the way it moved, and its line's width value. */
export interface SlopeItem {
  label: string;
  before: number;
  after: number;
  direction: Direction;
  /** The value the line's width shows, when the brief gives one. */
  width?: number;
  /** Source positions of the item's rows. */
  rows: number[];
}

/** Where an item's two points come from: a period key with two levels, or two value columns. */
export type SlopeSource =
  | { kind: 'periods'; period: FieldRef; value: FieldRef }
  | { kind: 'columns'; before: FieldRef; after: FieldRef };

/** What a slope chart derives from: the item key, the source of its two points, the width value, and how rows combine. */
export interface SlopeQuery {
  item: FieldRef;
  source: SlopeSource;
  width: FieldRef | undefined;
  aggregate: Aggregate;
}

/** The items with both points, sorted by label (code points), and the names of the two points in order. */
export interface DerivedSlopes {
  items: SlopeItem[];
  ends: [string, string];
  /** Items left out for a value at only one of the two ends, said in the note. Default: none. */
  incomplete?: string[];
}

/** The way a value moved from `before` to `after`: exact comparison, so only equal values are unchanged. */
export function direction(before: number, after: number): Direction {
  return after > before ? 'up' : after < before ? 'down' : 'unchanged';
}

/** The two periods' labels in the period key's own order (time, number, or level), from the groups of [item, period]. */
export function periodsInOrder(groups: readonly RowGroup[]): string[] {
  const order = new Map<string, number>();
  for (const g of groups) if (!order.has(g.labels[1]!)) order.set(g.labels[1]!, g.sortKeys[1]!);
  return [...order].sort((a, b) => a[1] - b[1] || compareText(a[0], b[0])).map(([label]) => label);
}

interface Point { value: number; rows: number[] }

function combined(groups: readonly RowGroup[], aggregate: Aggregate, labelOf: (g: RowGroup) => string, problems: Diagnostic[]): Map<string, Point> {
  const { combine, verb } = AGGREGATORS[aggregate];
  const repeated = groups.filter((g) => g.values.length > 1);
  if (repeated.length) {
    problems.push(diagnostic('derive.aggregated', `${count(repeated.length, 'point')} ${agree(repeated.length, 'has', 'have')} several rows (first: ${JSON.stringify(repeated[0]!.labels.join(' at '))}); their values are ${verb} (aggregate: ${aggregate})`, {
      hint: 'set `aggregate:` to sum, mean, count, max or min',
    }));
  }
  return new Map(groups.map((g) => [labelOf(g), { value: combine(g.values), rows: g.rows }]));
}

/** Each item's point at the first and at the second end. */
function pointsOf(table: Table, query: SlopeQuery, problems: Diagnostic[]): { first: Map<string, Point>; second: Map<string, Point>; ends: [string, string] } {
  const { source, item, aggregate } = query;
  if (source.kind === 'columns') {
    const one = groupRows(table, { keys: [item], value: source.before });
    const two = groupRows(table, { keys: [item], value: source.after });
    problems.push(...one.diagnostics, ...two.diagnostics);
    const label = (g: RowGroup) => g.labels[0]!;
    // The same rows repeat for both columns, so a combination is said once.
    return { first: combined(one.groups, aggregate, label, problems), second: combined(two.groups, aggregate, label, []), ends: [source.before.label, source.after.label] };
  }
  const grouped = groupRows(table, { keys: [item, source.period], value: source.value });
  problems.push(...grouped.diagnostics);
  const [p1, p2] = periodsInOrder(grouped.groups) as [string, string];
  const at = (p: string) => combined(grouped.groups.filter((g) => g.labels[1] === p), aggregate, (g) => g.labels[0]!, problems);
  return { first: at(p1), second: at(p2), ends: [p1, p2] };
}

/** The mean width value of each item, from its rows. */
function widthsOf(table: Table, query: SlopeQuery, problems: Diagnostic[]): Map<string, number> | undefined {
  if (!query.width) return undefined;
  const grouped = groupRows(table, { keys: [query.item], value: query.width });
  problems.push(...grouped.diagnostics);
  // A group's values and rows run in parallel, so the rows named are exactly the negative ones.
  const rows = grouped.groups.flatMap((g) => g.rows.filter((_, i) => g.values[i]! < 0));
  if (rows.length) {
    problems.push(diagnostic('derive.slope-width-negative', `${describeRows(rows, table.positionNoun)} ha${rows.length === 1 ? 's' : 've'} a negative \`${query.width.name}\`, and a line cannot be thinner than nothing`, {
      file: table.origin.file, field: query.width.name, rows, expected: 'zero or more', hint: `fix those values, or leave line width out (remove \`${query.width.name}\` from \`values:\`)`,
    }));
  }
  return new Map(grouped.groups.map((g) => [g.labels[0]!, AGGREGATORS.mean.combine(g.values)]));
}

/**
 * The derive stage for slope charts: rows → one item per key with its value at the two ends,
 * combined by the aggregate where rows repeat, and the way it moved. An item missing one of its
 * two points is left out with a warning naming it; missing values are never drawn as zero.
 */
export function deriveSlopes(table: Table, query: SlopeQuery): Outcome<DerivedSlopes> {
  const problems: Diagnostic[] = [];
  const { first, second, ends } = pointsOf(table, query, problems);
  const widths = widthsOf(table, query, problems);
  const labels = [...new Set([...first.keys(), ...second.keys()])].sort(compareText);
  const items: SlopeItem[] = [];
  const incomplete: string[] = [];
  for (const label of labels) {
    const [a, b] = [first.get(label), second.get(label)];
    if (!a || !b) { incomplete.push(label); continue; }
    const width = widths?.get(label);
    items.push({ label, before: a.value, after: b.value, direction: direction(a.value, b.value), ...(width !== undefined ? { width } : {}), rows: [...a.rows, ...b.rows].sort((x, y) => x - y) });
  }
  if (incomplete.length) {
    problems.push(diagnostic('derive.slope-incomplete', `${count(incomplete.length, 'item')} ${agree(incomplete.length, 'has', 'have')} a value at only one of ${ends[0]} and ${ends[1]} and ${agree(incomplete.length, 'is', 'are')} left out (${incomplete.slice(0, 3).join(', ')}${incomplete.length > 3 ? ', …' : ''})`, {
      field: query.item.name, found: incomplete.slice(0, 3).join(', '), hint: 'give every item a value at both points',
    }));
  }
  if (items.length === 0) {
    problems.push(diagnostic('derive.no-rows', 'no item has a value at both points, so there is nothing to draw', {
      file: table.origin.file, expected: 'at least one item with both values', hint: 'check that the key and value columns are the ones you meant',
    }));
    return failure(problems);
  }
  return problems.some((p) => p.severity === 'error') ? failure(problems) : success({ items, ends, ...(incomplete.length ? { incomplete } : {}) }, problems);
}
