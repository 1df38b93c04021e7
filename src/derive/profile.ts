import { describeRows, diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import { keyText } from '../fields/labels.js';
import type { FieldRef } from '../fields/types.js';
import { columnOf, type Table } from '../table/types.js';
import { agree } from '../diagnostics/words.js';

/** One item of a profile: its label and its value of each attribute, in the attributes' order. */
export interface ProfileItem {
  label: string;
  values: number[];
  /** The item's row index in the table. */
  row: number;
}

/**
 * The items of a profile: every row with a finite value for each attribute, labelled by the key
 * (or its row position). Rows missing an attribute are left out, named in one warning, never
 * drawn as zero.
 */
export function profileItems(table: Table, attributes: readonly FieldRef[], key: FieldRef | undefined): { items: ProfileItem[]; diagnostics: Diagnostic[] } {
  const columns = attributes.map((a) => columnOf(table, a.name)!);
  const keyColumn = key ? columnOf(table, key.name) : undefined;
  const items: ProfileItem[] = [];
  const missing: number[] = [];
  for (let i = 0; i < table.rowCount; i++) {
    const values = columns.map((c) => c.values[i]);
    if (!values.every((v): v is number => typeof v === 'number' && Number.isFinite(v))) { missing.push(table.rowPositions[i]!); continue; }
    items.push({ label: (keyColumn && keyText(keyColumn, i)) ?? `${table.positionNoun} ${table.rowPositions[i]}`, values, row: i });
  }
  const diagnostics = missing.length ? [diagnostic('derive.missing-values', `${describeRows(missing, table.positionNoun)} ${agree(missing.length, 'lacks', 'lack')} a value of some attribute and ${agree(missing.length, 'is', 'are')} left out, not drawn as zero`, {
    file: table.origin.file, rows: missing, hint: 'fill in the values, or remove those rows if they are not data',
  })] : [];
  return { items, diagnostics };
}
