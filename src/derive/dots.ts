import type { Aggregate } from '../brief/types.js';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import type { FieldRef } from '../fields/types.js';
import type { Table } from '../table/types.js';
import { AGGREGATORS } from './aggregate.js';
import { groupRows } from './group.js';
import { compareNatural, compareText } from './order.js';
import { agree, count } from '../diagnostics/words.js';

/** What the dot derivation needs: the key, one or two values (a dumbbell's two ends), the order and how rows combine. */
export interface DotQuery {
  key: FieldRef;
  values: FieldRef[];
  /** value: largest (last value) first; label: A→Z; data: as the rows give them; key: the key's own order. */
  order: 'value' | 'label' | 'data' | 'key';
  aggregate: Aggregate;
}

/** One row of dots: the key's label and one value per value field, in order. */
export interface DotRow {
  label: string;
  values: number[];
  /** Where the key sits in its own order (time, number or level index). */
  sortKey: number;
}

function sortRows(rows: DotRow[], order: DotQuery['order']): DotRow[] {
  const last = (r: DotRow) => r.values[r.values.length - 1]!;
  if (order === 'value') return [...rows].sort((a, b) => last(b) - last(a) || compareText(a.label, b.label));
  if (order === 'label') return [...rows].sort((a, b) => compareNatural(a.label, b.label));
  if (order === 'key') return [...rows].sort((a, b) => a.sortKey - b.sortKey || compareText(a.label, b.label));
  return rows;
}

/**
 * The derive step for dots: one row per key with each value combined by the aggregate (rows
 * missing a value left out with a warning naming them), only keys that have every value, sorted
 * as the query says (by value: by the last value, largest first, ties by label).
 */
export function deriveDotRows(table: Table, query: DotQuery): { rows: DotRow[]; diagnostics: Diagnostic[] } {
  const combine = AGGREGATORS[query.aggregate].combine;
  const grouped = query.values.map((value) => groupRows(table, { keys: [query.key], value }));
  const diagnostics = grouped.flatMap((g) => g.diagnostics);
  const byLabel = grouped.map((g) => new Map(g.groups.map((group) => [group.labels[0]!, group])));
  const rows: DotRow[] = [];
  for (const group of grouped[0]!.groups) {
    const label = group.labels[0]!;
    const all = byLabel.map((m) => m.get(label));
    if (all.some((g) => g === undefined)) continue;
    rows.push({ label, values: all.map((g) => combine(g!.values)), sortKey: group.sortKeys[0]! });
  }
  const several = grouped[0]!.groups.filter((g) => g.values.length > 1).length;
  if (several && query.aggregate !== 'count') {
    diagnostics.push(diagnostic('derive.aggregated', `${count(several, 'key')} ${agree(several, 'has', 'have')} several rows; their values are ${AGGREGATORS[query.aggregate].verb} (aggregate: ${query.aggregate})`, {
      field: query.key.name, hint: 'set `aggregate:` to sum, mean, count, max or min',
    }));
  }
  return { rows: sortRows(rows.filter((r) => r.values.every(Number.isFinite)), query.order), diagnostics };
}
