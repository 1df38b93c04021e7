import { compareNatural, compareText } from './order.js';
import type { Diagnostic } from '../diagnostics/diagnostic.js';
import { keyText } from '../fields/labels.js';
import type { FieldRef } from '../fields/types.js';
import { columnOf, type Table } from '../table/types.js';
import { keyOrderOf, missingDiagnostic } from './group.js';

/** The rows of one facet level, as a table of their own. */
export interface FacetPart {
  /** The level as a reader sees it (the panel's title). */
  label: string;
  /** Where the level sits in the facet field's own order (time, number, or level index). */
  sortKey: number;
  table: Table;
}

/** A table's rows at these indexes, in order: every column sliced alike. */
export function tableRows(table: Table, indexes: readonly number[]): Table {
  const columns = table.columns.map((c) => {
    const missing = new Set(c.missing);
    return {
      ...c,
      values: indexes.map((i) => c.values[i]!),
      text: indexes.map((i) => c.text[i]!),
      missing: indexes.flatMap((i, j) => (missing.has(i) ? [j] : [])),
    };
  });
  return { ...table, columns, rowCount: indexes.length, rowPositions: indexes.map((i) => table.rowPositions[i]!) };
}

/**
 * Splits a table by the levels of a facet field, one part per level in order of first
 * appearance. Rows with no facet level are left out, named in a warning, never put in a panel
 * of their own.
 */
export function splitTable(table: Table, facet: FieldRef): { parts: FacetPart[]; diagnostics: Diagnostic[] } {
  const column = columnOf(table, facet.name)!;
  const orderOf = keyOrderOf(facet, column);
  const byLevel = new Map<string, { sortKey: number; rows: number[] }>();
  const missing: number[] = [];
  for (let i = 0; i < table.rowCount; i++) {
    const label = keyText(column, i, facet.locale);
    if (label === null) { missing.push(table.rowPositions[i]!); continue; }
    let level = byLevel.get(label);
    if (!level) { level = { sortKey: orderOf(i), rows: [] }; byLevel.set(label, level); }
    level.rows.push(i);
  }
  const parts = [...byLevel].map(([label, { sortKey, rows }]) => ({ label, sortKey, table: tableRows(table, rows) }));
  const diagnostics = missing.length ? [missingDiagnostic(missing, table.positionNoun, `no \`${facet.name}\``, table, facet.name, 'give every row a facet level, or remove those rows', false)] : [];
  return { parts, diagnostics };
}

/** A panel to order: its label, its place in the facet's own order, and the form's facet value. */
export interface Rankable {
  label: string;
  sortKey: number;
  value: number;
}

/**
 * Panels in order: by value, largest first (ties by label, by code points); by label (natural
 * order); in the facet field's own order; or as the data gives them.
 */
export function orderPanels<T extends Rankable>(panels: readonly T[], order: 'value' | 'label' | 'data' | 'key'): T[] {
  if (order === 'value') return [...panels].sort((a, b) => b.value - a.value || compareText(a.label, b.label));
  if (order === 'label') return [...panels].sort((a, b) => compareNatural(a.label, b.label));
  if (order === 'key') return [...panels].sort((a, b) => a.sortKey - b.sortKey || compareText(a.label, b.label));
  return [...panels];
}
