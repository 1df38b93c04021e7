import type { Aggregate } from '../brief/types.js';
import type { Diagnostic } from '../diagnostics/diagnostic.js';
import type { FieldRef } from '../fields/types.js';
import { keyText } from '../fields/labels.js';
import { columnOf, type Column, type Table } from '../table/types.js';
import { AGGREGATORS } from './aggregate.js';
import { keyOrderOf, missingDiagnostic } from './group.js';

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
  /** Dates a date key skipped, put back as rows or columns of missing cells. Default: none. */
  inserted?: { rows: string[]; columns: string[] };
}

/** Labels of one key, each with its index in order of first appearance and its place in the key's own order. */
class Labels {
  readonly index = new Map<string, number>();
  readonly labels: string[] = [];
  readonly sortKeys: number[] = [];
  at(label: string, sortKey: () => number): number {
    let i = this.index.get(label);
    if (i === undefined) { i = this.labels.length; this.index.set(label, i); this.labels.push(label); this.sortKeys.push(sortKey()); }
    return i;
  }
  /** Position of each label in drawing order: its own order (ties by code point) when the key is ordered, else first appearance. */
  positions(ordered: boolean): Int32Array {
    const order = this.labels.map((_, i) => i);
    const { labels: l, sortKeys: k } = this;
    if (ordered) order.sort((a, b) => k[a]! - k[b]! || (l[a]! < l[b]! ? -1 : l[a]! > l[b]! ? 1 : 0));
    const at = new Int32Array(order.length);
    order.forEach((i, p) => { at[i] = p; });
    return at;
  }
}

/** Each row's (row, column) label indexes and value; rows missing a key or the value are left out and named. */
function readCells(table: Table, rows: FieldRef, columns: FieldRef, value: FieldRef) {
  const [rc, cc, vc] = [rows, columns, value].map((f) => columnOf(table, f.name)!) as [Column, Column, Column];
  const [rowOrder, columnOrder] = [keyOrderOf(rows, rc), keyOrderOf(columns, cc)];
  const [r, c] = [new Labels(), new Labels()];
  const entries: number[] = [];
  const missing: number[][] = [[], [], []];
  for (let i = 0; i < table.rowCount; i++) {
    // Plain statements: this runs once per row (a million for a 1,000 × 1,000 matrix).
    const rl = keyText(rc, i, rows.locale), cl = keyText(cc, i, columns.locale), v = vc.values[i];
    const gone = rl === null ? 0 : cl === null ? 1 : typeof v !== 'number' ? 2 : -1;
    if (gone >= 0) { missing[gone]!.push(table.rowPositions[i]!); continue; }
    entries.push(r.at(rl!, () => rowOrder(i)), c.at(cl!, () => columnOrder(i)), v as number);
  }
  const noun = table.positionNoun;
  const diagnostics = [rows, columns].flatMap((k, j) => (missing[j]!.length ? [missingDiagnostic(missing[j]!, noun, `no \`${k.name}\``, table, k.name, 'give every row a key', false)] : []));
  if (missing[2]!.length) diagnostics.unshift(missingDiagnostic(missing[2]!, noun, `no usable \`${value.name}\` (missing or not finite)`, table, value.name, 'fill in the values, or remove those rows if they are not data', true));
  return { r, c, entries, diagnostics };
}

/**
 * The table as a matrix of two keys: rows sharing a (row, column) pair combined by `aggregate`;
 * pairs the data never give are missing (NaN), never zero. Labels come in the key's own order
 * when `ordered`, else in order of first appearance.
 */
export function buildMatrix(table: Table, rows: FieldRef, columns: FieldRef, value: FieldRef, aggregate: Aggregate, ordered: [boolean, boolean]): ValueMatrix {
  const { r, c, entries, diagnostics } = readCells(table, rows, columns, value);
  const [rp, cp] = [r.positions(ordered[0]), c.positions(ordered[1])];
  const nc = c.labels.length;
  const cells = new Float64Array(r.labels.length * nc).fill(NaN);
  const shared = new Map<number, number[]>();
  for (let e = 0; e < entries.length; e += 3) {
    const at = rp[entries[e]!]! * nc + cp[entries[e + 1]!]!;
    const v = entries[e + 2]!;
    if (Number.isNaN(cells[at]!)) { cells[at] = v; continue; }
    const list = shared.get(at) ?? [cells[at]!];
    list.push(v);
    shared.set(at, list);
  }
  const combine = AGGREGATORS[aggregate].combine;
  // One row per cell is the common case: only cells that several rows share are combined (a count of one row is 1).
  if (aggregate === 'count') for (let i = 0; i < cells.length; i++) if (!Number.isNaN(cells[i]!)) cells[i] = 1;
  for (const [at, list] of shared) cells[at] = combine(list);
  let missing = 0;
  for (const v of cells) if (Number.isNaN(v)) missing++;
  const inOrder = (l: Labels, p: Int32Array) => { const out = new Array<string>(l.labels.length); l.labels.forEach((x, i) => { out[p[i]!] = x; }); return out; };
  return { rows: inOrder(r, rp), columns: inOrder(c, cp), cells, missing, combined: shared.size, diagnostics };
}

/** The matrix's rows as vectors (columns as vectors with `transpose`). */
export function vectorsOf(m: Pick<ValueMatrix, 'rows' | 'columns' | 'cells'>, transpose: boolean): Float64Array[] {
  const [nr, nc] = [m.rows.length, m.columns.length];
  if (!transpose) return Array.from({ length: nr }, (_, r) => m.cells.subarray(r * nc, (r + 1) * nc));
  return Array.from({ length: nc }, (_, c) => Float64Array.from({ length: nr }, (_, r) => m.cells[r * nc + c]!));
}
