import type { Aggregate } from '../brief/types.js';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import type { FieldRef } from '../fields/types.js';
import type { Table } from '../table/types.js';
import { AGGREGATORS } from './aggregate.js';
import { groupRows, type Grouped } from './group.js';
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

/** A key drawn with only some of its values (a dumbbell with one end): which values it lacks. */
export interface PartialRow {
  label: string;
  missing: string[];
}

/** The value a row sorts by: its last known value. */
const lastKnown = (r: DotRow) => [...r.values].reverse().find((v) => !Number.isNaN(v)) ?? 0;

function sortRows(rows: DotRow[], order: DotQuery['order']): DotRow[] {
  if (order === 'value') return [...rows].sort((a, b) => lastKnown(b) - lastKnown(a) || compareText(a.label, b.label));
  if (order === 'label') return [...rows].sort((a, b) => compareNatural(a.label, b.label));
  if (order === 'key') return [...rows].sort((a, b) => a.sortKey - b.sortKey || compareText(a.label, b.label));
  return rows;
}

/** Every key that any value's rows name, in order of first appearance, with its place in the key's own order. */
function keysOf(grouped: Grouped[]): Map<string, number> {
  const keys = new Map<string, number>();
  for (const g of grouped) for (const group of g.groups) if (!keys.has(group.labels[0]!)) keys.set(group.labels[0]!, group.sortKeys[0]!);
  return keys;
}

/**
 * The derive step for dots: one row per key with each value combined by the aggregate (rows
 * missing a value left out with a warning naming them), sorted as the query says (by value: by
 * the last known value, largest first, ties by label). A key with only some of its values keeps
 * the known dots (NaN for the others) and is listed in `partial`; a key with none is in `noData`.
 */
export function deriveDotRows(table: Table, query: DotQuery): { rows: DotRow[]; diagnostics: Diagnostic[]; noData: string[]; partial: PartialRow[] } {
  const combine = AGGREGATORS[query.aggregate].combine;
  const grouped = query.values.map((value) => groupRows(table, { keys: [query.key], value }));
  const diagnostics = grouped.flatMap((g) => g.diagnostics);
  const byLabel = grouped.map((g) => new Map(g.groups.map((group) => [group.labels[0]!, group])));
  const rows: DotRow[] = [];
  const partial: PartialRow[] = [];
  for (const [label, sortKey] of keysOf(grouped)) {
    const values = byLabel.map((m) => { const g = m.get(label); const v = g ? combine(g.values) : Number.NaN; return Number.isFinite(v) ? v : Number.NaN; });
    if (values.every(Number.isNaN)) continue;
    rows.push({ label, values, sortKey });
    const missing = query.values.filter((_, i) => Number.isNaN(values[i]!)).map((v) => v.label);
    if (missing.length) partial.push({ label, missing });
  }
  const drawn = new Set(rows.map((r) => r.label));
  const noData = [...new Set(grouped.flatMap((g) => g.noValue))].filter((l) => !drawn.has(l));
  const several = grouped[0]!.groups.filter((g) => g.values.length > 1).length;
  if (several && query.aggregate !== 'count') {
    diagnostics.push(diagnostic('derive.aggregated', `${count(several, 'key')} ${agree(several, 'has', 'have')} several rows; their values are ${AGGREGATORS[query.aggregate].verb} (aggregate: ${query.aggregate})`, {
      field: query.key.name, hint: 'set `aggregate:` to sum, mean, count, max or min',
    }));
  }
  return { rows: sortRows(rows, query.order), diagnostics, noData, partial };
}
