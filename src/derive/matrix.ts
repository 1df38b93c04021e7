import type { Aggregate } from '../brief/types.js';
import type { Diagnostic } from '../diagnostics/diagnostic.js';
import type { FieldRef } from '../fields/types.js';
import type { Table } from '../table/types.js';
import { AGGREGATORS } from './aggregate.js';
import { groupRows } from './group.js';

/** A value per (row, column) pair of two keys; NaN where the data have no value. */
export interface ValueMatrix {
  /** Row labels and column labels, in the order of first appearance (or the key's own order). */
  rows: string[];
  columns: string[];
  /** Row-major: cells[r * columns.length + c]. */
  cells: Float64Array;
  /** Cells with no value. */
  missing: number;
  /** Cells that combined more than one row. */
  combined: number;
  diagnostics: Diagnostic[];
}

/** Labels in the key's own order when it has levels or numbers (sort keys), else in order of first appearance. */
function labelsOf(groups: { labels: string[]; sortKeys: number[] }[], at: 0 | 1, ordered: boolean): string[] {
  const seen = new Map<string, number>();
  for (const g of groups) if (!seen.has(g.labels[at]!)) seen.set(g.labels[at]!, g.sortKeys[at]!);
  const labels = [...seen.keys()];
  return ordered ? labels.sort((a, b) => seen.get(a)! - seen.get(b)! || (a < b ? -1 : a > b ? 1 : 0)) : labels;
}

/**
 * The table as a matrix of two keys: rows sharing a (row, column) pair combined by `aggregate`;
 * pairs the data never give are missing (NaN), never zero.
 */
export function buildMatrix(table: Table, rows: FieldRef, columns: FieldRef, value: FieldRef, aggregate: Aggregate, ordered: [boolean, boolean]): ValueMatrix {
  const grouped = groupRows(table, { keys: [rows, columns], value });
  const rowLabels = labelsOf(grouped.groups, 0, ordered[0]);
  const columnLabels = labelsOf(grouped.groups, 1, ordered[1]);
  const [ri, ci] = [new Map(rowLabels.map((l, i) => [l, i])), new Map(columnLabels.map((l, i) => [l, i]))];
  const cells = new Float64Array(rowLabels.length * columnLabels.length).fill(NaN);
  const combine = AGGREGATORS[aggregate].combine;
  let combined = 0;
  for (const g of grouped.groups) {
    cells[ri.get(g.labels[0]!)! * columnLabels.length + ci.get(g.labels[1]!)!] = combine(g.values);
    if (g.values.length > 1) combined++;
  }
  let missing = 0;
  for (const v of cells) if (Number.isNaN(v)) missing++;
  return { rows: rowLabels, columns: columnLabels, cells, missing, combined, diagnostics: grouped.diagnostics };
}

/** The matrix's rows as vectors (columns as vectors with `transpose`). */
export function vectorsOf(m: Pick<ValueMatrix, 'rows' | 'columns' | 'cells'>, transpose: boolean): Float64Array[] {
  const [nr, nc] = [m.rows.length, m.columns.length];
  if (!transpose) return Array.from({ length: nr }, (_, r) => m.cells.subarray(r * nc, (r + 1) * nc));
  return Array.from({ length: nc }, (_, c) => Float64Array.from({ length: nr }, (_, r) => m.cells[r * nc + c]!));
}
