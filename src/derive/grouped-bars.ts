import { diagnostic, failure, success, type Diagnostic, type Outcome } from '../diagnostics/diagnostic.js';
import type { FieldRef } from '../fields/types.js';
import type { Table } from '../table/types.js';
import { combineGroups, sortBars, type BarQuery } from './bars.js';
import { groupRows } from './group.js';

/** What the grouped-bar derivation needs from the plan: the bars' query, the group field and the groups in their one order. */
export interface GroupedBarQuery extends BarQuery {
  group: FieldRef;
  /** The groups, in the order they stand within every key (the same in every key and panel). */
  groups: string[];
}

/** One bar of a grouped chart: its key, its group, the value it shows and the rows behind it. */
export interface GroupedBar {
  key: string;
  group: string;
  value: number;
  count: number;
  rows: number[];
}

/** The numbers a grouped bar chart draws. */
export interface DerivedGroupedBars<Q extends GroupedBarQuery = GroupedBarQuery> {
  query: Q;
  /** The keys, in the chosen order (by value: the key's overall value, largest first). */
  keys: string[];
  /** Every bar drawn, key by key, each key's bars in the groups' order; a missing combination has no bar. */
  bars: GroupedBar[];
  /** Name of the value in data terms: the value column, or "count". */
  valueName: string;
  /** Key and group pairs with no bar ("North / 2024"), in drawing order: no row, or no usable value. */
  noData: string[];
}

/** The keys in the query's order: by value, each key's rows combined over every group (so by its total for sums). */
function orderKeys(table: Table, query: GroupedBarQuery): string[] {
  const grouped = groupRows(table, { keys: [query.key], value: query.value });
  const keyBars = combineGroups(grouped.groups, query, []) ?? [];
  const keyOf = new Map(grouped.groups.map((g) => [g.labels[0]!, g.sortKeys[0]!]));
  return sortBars(keyBars, keyOf, query.order).map((b) => b.label);
}

/**
 * The derive stage for grouped bars: rows → one bar per key and group, combined by the
 * aggregate; keys in the chosen order, groups in the plan's one order within every key. Never
 * folded (an "Others" key would mix groups): more bars than the plot holds (`capacityFor` the keys) is an
 * error with a way out. Missing values are left out with a warning, never drawn as 0.
 */
export function deriveGroupedBars<Q extends GroupedBarQuery>(table: Table, query: Q, capacityFor: (keys: string[]) => number): Outcome<DerivedGroupedBars<Q>> {
  const grouped = groupRows(table, { keys: [query.key, query.group], value: query.value });
  const problems: Diagnostic[] = [...grouped.diagnostics];
  if (grouped.groups.length === 0) {
    problems.push(diagnostic('derive.no-rows', 'no row has both keys and a usable value, so there is nothing to draw', {
      file: table.origin.file, hint: 'check that the key and value columns are the ones you meant', expected: 'at least one complete row',
    }));
    return failure(problems);
  }
  const cells = combineGroups(grouped.groups, query, problems);
  if (!cells) return failure(problems);
  const keys = orderKeys(table, query);
  const slots = keys.length * query.groups.length;
  const capacity = capacityFor(keys);
  if (capacity >= 1 && slots > capacity) {
    problems.push(diagnostic('derive.too-many-grouped-bars', `${keys.length} keys × ${query.groups.length} groups make ${slots} bars, but the plot holds ${capacity} at 3 px each`, {
      field: query.key.name, found: `${slots} bars`, expected: `at most ${capacity}`, hint: `show one panel per group with \`facet: ${query.group.name}\`, filter the table to fewer keys, or make the chart larger with \`size:\``,
    }));
    return failure(problems);
  }
  const byCell = new Map(grouped.groups.map((g, i) => [JSON.stringify(g.labels), cells[i]!]));
  const noData: string[] = [];
  const bars: GroupedBar[] = keys.flatMap((key) => query.groups.flatMap((group) => {
    const cell = byCell.get(JSON.stringify([key, group]));
    if (!cell) noData.push(`${key} / ${group}`);
    return cell ? [{ key, group, value: cell.value, count: cell.count, rows: cell.rows }] : [];
  }));
  return success({ query, keys, bars, valueName: query.value?.name ?? 'count', noData }, problems);
}
