import type { FieldType } from '../brief/types.js';
import { describeRows, diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import { isMissingText, parseBooleanText, parseIsoDate, parseNumberText } from './cells.js';
import type { RawCell, RawTable } from './parse.js';
import type { Column, ColumnType, DateGrain, Table, TableOrigin } from './types.js';

/** Share of readable cells that makes a column numeric despite a few stray texts (common practice). */
const MOSTLY = 0.8;

type Reading = { value: number | string | boolean; grain?: DateGrain } | null | undefined;

function readAs(type: ColumnType, cell: RawCell): Reading {
  if (cell === null) return null;
  if (typeof cell === 'string' && isMissingText(cell)) return null;
  if (type === 'number') {
    const n = typeof cell === 'number' ? cell : typeof cell === 'string' ? parseNumberText(cell) : undefined;
    return n === undefined ? undefined : { value: n };
  }
  if (type === 'date') {
    const d = typeof cell === 'string' ? parseIsoDate(cell) : undefined;
    return d === undefined ? undefined : { value: d.time, grain: d.grain };
  }
  if (type === 'boolean') {
    const b = typeof cell === 'boolean' ? cell : typeof cell === 'string' ? parseBooleanText(cell) : undefined;
    return b === undefined ? undefined : { value: b };
  }
  return { value: String(cell).trim() };
}

function share(type: ColumnType, cells: RawCell[]): { present: number; readable: number } {
  let present = 0;
  let readable = 0;
  for (const cell of cells) {
    const r = readAs(type, cell);
    if (r === null) continue;
    present++;
    if (r !== undefined) readable++;
  }
  return { present, readable };
}

/** The storage type a field hint forces, if any. */
function forcedType(hint: FieldType | undefined): ColumnType | undefined {
  if (hint === 'quantitative') return 'number';
  if (hint === 'temporal') return 'date';
  if (hint === 'categorical' || hint === 'ordinal' || hint === 'cyclic') return 'text';
  return undefined;
}

/** Whether every present cell reads as the type (and at least one is present); stops at the first that does not. */
function allRead(type: ColumnType, cells: RawCell[]): boolean {
  let present = false;
  for (const cell of cells) {
    const r = readAs(type, cell);
    if (r === undefined) return false;
    if (r !== null) present = true;
  }
  return present;
}

function guessType(cells: RawCell[]): { type: ColumnType; mixed: boolean } {
  for (const type of ['number', 'date', 'boolean'] as const) {
    if (allRead(type, cells)) return { type, mixed: false };
  }
  const { present, readable } = share('number', cells);
  if (present > 0 && readable / present >= MOSTLY) return { type: 'number', mixed: true };
  return { type: 'text', mixed: false };
}

const GRAIN_RANK: DateGrain[] = ['year', 'month', 'day', 'minute', 'second'];

function buildColumn(name: string, type: ColumnType, cells: RawCell[]): { column: Column; unreadable: number[] } {
  const values: Column['values'] = [];
  const text: Column['text'] = [];
  const missing: number[] = [];
  const unreadable: number[] = [];
  let grain: DateGrain | undefined;
  cells.forEach((cell, i) => {
    text.push(cell === null ? null : String(cell).trim());
    const r = readAs(type, cell);
    const finite = r && (typeof r.value !== 'number' || Number.isFinite(r.value));
    if (r && finite) {
      values.push(r.value);
      if (r.grain && (!grain || GRAIN_RANK.indexOf(r.grain) > GRAIN_RANK.indexOf(grain))) grain = r.grain;
    } else {
      values.push(null);
      missing.push(i);
      if (r === undefined) unreadable.push(i);
    }
  });
  const column: Column = { name, type, values, text, missing };
  if (type === 'date') column.grain = grain ?? 'day';
  return { column, unreadable };
}

function typeWord(type: ColumnType): string {
  return type === 'number' ? 'numbers' : type === 'date' ? 'ISO 8601 dates' : type === 'boolean' ? 'true/false' : 'text';
}

/**
 * Types each column of a raw table: numbers, ISO 8601 dates, booleans or text. A field hint's
 * type wins. A column of mostly numbers keeps its numbers and warns about the rest by row.
 */
export function inferTable(raw: RawTable, origin: TableOrigin, hints: Record<string, FieldType | undefined>): { table: Table; diagnostics: Diagnostic[] } {
  const diagnostics: Diagnostic[] = [];
  const columns = raw.names.map((name, c) => {
    const cells = raw.rows.map((row) => row[c] ?? null);
    const forced = forcedType(hints[name]);
    const guess = forced ? { type: forced, mixed: false } : guessType(cells);
    const { column, unreadable } = buildColumn(name, guess.type, cells);
    if (unreadable.length) {
      const rows = unreadable.map((i) => raw.positions[i]!);
      const sample = column.text[unreadable[0]!];
      const allBad = unreadable.length === cells.filter((x) => readAs('text', x) !== null).length;
      if (forced && allBad) {
        diagnostics.push(diagnostic('table.type-mismatch', `column \`${name}\` is declared ${hints[name]} but none of its cells read as ${typeWord(guess.type)}`, {
          file: origin.file, field: name, path: `/fields/${name}/type`, found: JSON.stringify(sample), expected: typeWord(guess.type),
          hint: `remove \`fields.${name}.type\` or fix the data`,
        }));
      } else {
        diagnostics.push(diagnostic('table.mixed-column', `column \`${name}\` holds ${typeWord(guess.type)}, but ${describeRows(rows, raw.positionNoun)} hold${rows.length === 1 ? 's' : ''} other text (first: ${JSON.stringify(sample)}); ${rows.length === 1 ? 'that cell is' : 'those cells are'} treated as missing`, {
          file: origin.file, field: name, rows, found: JSON.stringify(sample), expected: typeWord(guess.type),
          hint: 'fix those cells, or write NA for a missing value',
        }));
      }
    }
    return column;
  });
  const table: Table = { origin, columns, rowCount: raw.rows.length, rowPositions: raw.positions, positionNoun: raw.positionNoun };
  return { table, diagnostics };
}
