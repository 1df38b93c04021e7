import { describeRows, diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import { keyText } from '../fields/labels.js';
import type { FieldRef } from '../fields/types.js';
import { columnOf, type Column, type Table } from '../table/types.js';

/** What to group: the key fields (one or more) and the value field, if any (none counts rows). */
export interface GroupQuery {
  keys: FieldRef[];
  value: FieldRef | undefined;
}

/** Rows that share one combination of key labels. */
export interface RowGroup {
  /** The key labels as a reader sees them, one per key field. */
  labels: string[];
  /** Where the first row's key sits in each key's own order (time, number, or level index). */
  sortKeys: number[];
  /** The values of the group's rows (1 per row when counting). */
  values: number[];
  /** Source positions of the rows. */
  rows: number[];
}

/** Where a row's key sits in the key's own order: time, number, or level index (levels looked up by Map, not indexOf). */
export function keyOrderOf(ref: FieldRef, column: Column): (row: number) => number {
  const index = new Map(ref.levels.map((level, i) => [level, i]));
  return (row) => {
    const v = column.values[row];
    if (typeof v === 'number') return v;
    return index.get(column.text[row] ?? '') ?? Number.MAX_SAFE_INTEGER;
  };
}

/** The warning naming rows left out for a missing or unusable cell (never drawn as zero). */
export function missingDiagnostic(rows: number[], noun: 'line' | 'row', what: string, table: Table, field: string, hint: string, notZero: boolean): Diagnostic {
  const one = rows.length === 1;
  return diagnostic('derive.missing-values', `${describeRows(rows, noun)} ha${one ? 's' : 've'} ${what} and ${one ? 'is' : 'are'} left out${notZero ? ', not drawn as zero' : ''}`, {
    file: table.origin.file, field, rows, hint,
  });
}

/** How many keys had several rows combined, how many rows at most, and whether every key had that many ("3 rows per lab"). */
export interface Combined {
  keys: number;
  most: number;
  every: boolean;
}

/** A table's rows in groups, and what was left out of them. */
export interface Grouped {
  groups: RowGroup[];
  diagnostics: Diagnostic[];
  /** Keys (labels joined by " / ") whose rows all lack a usable value: nothing of them is drawn. */
  noValue: string[];
}

/**
 * Groups a table's rows by their key labels, keeping each group's values and source rows, in
 * order of first appearance. Rows with no key or no usable value are left out, each kind named
 * in one diagnostic. Every form groups through here.
 */
export function groupRows(table: Table, query: GroupQuery): Grouped {
  const keyColumns = query.keys.map((k) => columnOf(table, k.name)!);
  const valueColumn = query.value ? columnOf(table, query.value.name)! : undefined;
  const orders = query.keys.map((k, i) => keyOrderOf(k, keyColumns[i]!));
  const locales = query.keys.map((k) => k.locale);
  const groups = new Map<string, RowGroup>();
  const missingValue: number[] = [];
  const missingValueKeys = new Map<string, string[]>();
  const missingKey: number[][] = query.keys.map(() => []);
  for (let i = 0; i < table.rowCount; i++) {
    const labels = keyColumns.map((c, j) => keyText(c, i, locales[j]));
    const absent = labels.findIndex((l) => l === null);
    if (absent >= 0) { missingKey[absent]!.push(table.rowPositions[i]!); continue; }
    const raw = valueColumn ? valueColumn.values[i] : 1;
    const id = labels.length === 1 ? labels[0]! : JSON.stringify(labels);
    if (typeof raw !== 'number') { missingValue.push(table.rowPositions[i]!); missingValueKeys.set(id, labels as string[]); continue; }
    let g = groups.get(id);
    if (!g) { g = { labels: labels as string[], sortKeys: orders.map((o) => o(i)), values: [], rows: [] }; groups.set(id, g); }
    g.values.push(raw);
    g.rows.push(table.rowPositions[i]!);
  }
  const noun = table.positionNoun;
  const diagnostics: Diagnostic[] = [];
  if (missingValue.length) diagnostics.push(missingDiagnostic(missingValue, noun, `no usable \`${query.value!.name}\` (missing or not finite)`, table, query.value!.name, 'fill in the values, or remove those rows if they are not data', true));
  query.keys.forEach((k, i) => {
    if (missingKey[i]!.length) diagnostics.push(missingDiagnostic(missingKey[i]!, noun, `no \`${k.name}\``, table, k.name, 'give every row a key', false));
  });
  const noValue = [...missingValueKeys].filter(([id]) => !groups.has(id)).map(([, labels]) => labels.join(' / '));
  return { groups: [...groups.values()], diagnostics, noValue };
}

/**
 * Which keys have several rows (with a usable value), counted without grouping the rows: a
 * million-row series is counted in one pass over a Map of counts, where grouping would build a
 * million groups. Undefined when no key repeats.
 */
export function repeatedKeys(table: Table, query: GroupQuery): Combined | undefined {
  const keyColumns = query.keys.map((k) => columnOf(table, k.name)!);
  const valueColumn = query.value ? columnOf(table, query.value.name)! : undefined;
  const counts = new Map<string, number>();
  for (let i = 0; i < table.rowCount; i++) {
    if (valueColumn && typeof valueColumn.values[i] !== 'number') continue;
    let id = '';
    let absent = false;
    for (const c of keyColumns) {
      const label = keyText(c, i);
      if (label === null) { absent = true; break; }
      id += `${label}\u0000`;
    }
    if (!absent) counts.set(id, (counts.get(id) ?? 0) + 1);
  }
  return combinedFromCounts([...counts.values()]);
}

/** Which keys repeat, from the number of rows of each key: how many have several, the most, and whether every key has that many. */
export function combinedFromCounts(counts: readonly number[]): Combined | undefined {
  let keys = 0;
  let most = 1;
  for (const n of counts) if (n > 1) { keys++; most = Math.max(most, n); }
  if (keys === 0) return undefined;
  return { keys, most, every: counts.every((n) => n === most) };
}
