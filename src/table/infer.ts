import type { FieldType } from '../brief/types.js';
import { describeRows, diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import { splitAffix } from './affix.js';
import { isMissingText, oneLine, parseBooleanText, parseNumberText, type DecimalMark } from './cells.js';
import { patternReader, readDateText, slashDates, type DateReader } from './date-format.js';
import { decimalMarkOf, eitherMark, numberReader, type NumberReader } from './decimal.js';
import type { RawCell, RawTable } from './parse.js';
import type { Column, ColumnType, DateGrain, Table, TableOrigin } from './types.js';
import { agree } from '../diagnostics/words.js';

/** Share of readable cells that makes a column numeric despite a few stray texts (common practice). */
const MOSTLY = 0.8;

type Reading = { value: number | string | boolean; grain?: DateGrain; quarter?: true } | null | undefined;

/** Whether a cell means "no value": empty, a missing-value token, or a NaN or infinite number (YAML's `.nan`, `.inf`). */
function isMissingCell(cell: RawCell): boolean {
  if (cell === null) return true;
  if (typeof cell === 'number') return !Number.isFinite(cell);
  return typeof cell === 'string' && isMissingText(cell);
}

/** Column names that say a column of whole numbers counts years (common practice in data exports). */
const YEAR_NAME = /^(years?|yr|fiscal[ _-]?year|fy|calendar[ _-]?year|jahr|année|annee|año|ano)$/i;

/**
 * A cell that is a year written as a whole number, 1000–9999 (ISO 8601's four-digit year, the
 * reduced precision of a calendar date), or undefined.
 */
function yearOf(cell: RawCell): number | undefined {
  const n = typeof cell === 'number' ? cell : typeof cell === 'string' && /^\s*\d{4}\s*$/.test(cell) ? Number(cell) : undefined;
  return n !== undefined && Number.isInteger(n) && n >= 1000 && n <= 9999 ? n : undefined;
}

/** Whether a number column is a column of years: a year-like name and every present cell a year. */
function yearColumn(name: string, cells: RawCell[]): boolean {
  if (!YEAR_NAME.test(name.trim())) return false;
  let present = false;
  for (const cell of cells) {
    if (isMissingCell(cell)) continue;
    if (yearOf(cell) === undefined) return false;
    present = true;
  }
  return present;
}

function readAs(type: ColumnType, cell: RawCell, readNumber: NumberReader, readDate: DateReader = readDateText): Reading {
  if (isMissingCell(cell)) return null;
  if (type === 'number') {
    const n = typeof cell === 'number' ? cell : typeof cell === 'string' ? readNumber(cell) : undefined;
    return n === undefined ? undefined : { value: n };
  }
  if (type === 'date') {
    const year = yearOf(cell);
    if (year !== undefined) return { value: Date.UTC(year, 0, 1), grain: 'year' };
    const d = typeof cell === 'string' ? readDate(cell) : undefined;
    return d === undefined ? undefined : { value: d.time, grain: d.grain, ...(d.quarter ? { quarter: d.quarter } : {}) };
  }
  if (type === 'boolean') {
    const b = typeof cell === 'boolean' ? cell : typeof cell === 'string' ? parseBooleanText(cell) : undefined;
    return b === undefined ? undefined : { value: b };
  }
  return { value: oneLine(String(cell)) };
}

/**
 * Whether at least MOSTLY of the present cells read as numbers. Stops once that share is out of
 * reach even if every cell left read as a number (a text column is settled in a few cells).
 */
function mostlyNumbers(cells: RawCell[], readNumber: NumberReader): boolean {
  let present = 0;
  let readable = 0;
  for (let i = 0; i < cells.length; i++) {
    const r = readAs('number', cells[i]!, readNumber);
    if (r === null) continue;
    present++;
    if (r !== undefined) readable++;
    const left = cells.length - 1 - i;
    if ((readable + left) / (present + left) < MOSTLY) return false;
  }
  return present > 0 && readable / present >= MOSTLY;
}

/** The storage type a field hint forces, if any. */
function forcedType(hint: FieldType | undefined): ColumnType | undefined {
  if (hint === 'quantitative') return 'number';
  if (hint === 'temporal') return 'date';
  if (hint === 'categorical' || hint === 'ordinal' || hint === 'cyclic') return 'text';
  return undefined;
}

/** Whether every present cell reads as the type (and at least one is present); stops at the first that does not. */
function allRead(type: ColumnType, cells: RawCell[], readNumber: NumberReader): boolean {
  let present = false;
  for (const cell of cells) {
    const r = readAs(type, cell, readNumber);
    if (r === undefined) return false;
    if (r !== null) present = true;
  }
  return present;
}

function guessType(cells: RawCell[], readNumber: NumberReader): { type: ColumnType; mixed: boolean } {
  for (const type of ['number', 'date', 'boolean'] as const) {
    if (allRead(type, cells, readNumber)) return { type, mixed: false };
  }
  if (mostlyNumbers(cells, readNumber)) return { type: 'number', mixed: true };
  return { type: 'text', mixed: false };
}

const GRAIN_RANK: DateGrain[] = ['year', 'month', 'day', 'minute', 'second'];

function buildColumn(name: string, type: ColumnType, cells: RawCell[], readNumber: NumberReader, readDate: DateReader): { column: Column; unreadable: number[] } {
  const values: Column['values'] = [];
  const text: Column['text'] = [];
  const missing: number[] = [];
  const unreadable: number[] = [];
  let grain: DateGrain | undefined;
  let unit: string | undefined;
  let quarters: boolean | undefined;
  cells.forEach((cell, i) => {
    text.push(cell === null || (typeof cell === 'number' && !Number.isFinite(cell)) ? null : oneLine(String(cell)));
    let r = readAs(type, cell, readNumber, readDate);
    // One column, one unit sign: "$640" beside "€4.2" is not a number to compare.
    const sign = type === 'number' && r && typeof cell === 'string' ? splitAffix(cell).unit : undefined;
    if (sign !== undefined && (unit ??= sign) !== sign) r = undefined;
    const finite = r && (typeof r.value !== 'number' || Number.isFinite(r.value));
    if (r && finite) {
      values.push(r.value);
      quarters = (quarters ?? true) && r.quarter === true;
      if (r.grain && (!grain || GRAIN_RANK.indexOf(r.grain) > GRAIN_RANK.indexOf(grain))) grain = r.grain;
    } else {
      values.push(null);
      missing.push(i);
      if (r === undefined) unreadable.push(i);
    }
  });
  const column: Column = { name, type, values, text, missing };
  if (type === 'date') column.grain = grain ?? 'day';
  if (type === 'date' && quarters) column.quarterly = true;
  if (unit !== undefined) column.unit = unit;
  return { column, unreadable };
}

function typeWord(type: ColumnType): string {
  return type === 'number' ? 'numbers' : type === 'date' ? 'ISO 8601 dates' : type === 'boolean' ? 'true/false' : 'text';
}

/** The reader for a column's numbers, or the ambiguity that keeps a numeric column from being read. */
function readerFor(raw: RawTable, cells: RawCell[], forced: ColumnType | undefined, name: string, origin: TableOrigin): NumberReader | Diagnostic {
  const mark = raw.separator === ';' ? decimalMarkOf(cells) : { ok: true as const, mark: '.' as const };
  if (mark.ok) return numberReader(raw.separator, mark.mark);
  const numeric = forced ? forced === 'number' : guessType(cells, eitherMark).type === 'number';
  if (!numeric) return numberReader(raw.separator, '.');
  const both = mark.comma !== mark.point;
  return diagnostic('table.ambiguous-decimal', both
    ? `column \`${name}\` writes decimals both with a comma (${JSON.stringify(mark.comma)}) and with a point (${JSON.stringify(mark.point)}), so its numbers cannot be read safely`
    : `column \`${name}\` of this semicolon-separated file has numbers such as ${JSON.stringify(mark.point)}, which read as a decimal point or as grouped thousands`, {
    file: origin.file, field: name, found: both ? `${mark.comma} and ${mark.point}` : mark.point, expected: 'one decimal mark for the whole column',
    hint: both ? 'write every number of the column with the same decimal mark' : 'write the numbers without grouping dots (1250), or give one value its decimals with a comma (1,5)',
  });
}

/** Slash dates read as text: 01/03/2026 is 1 March or 3 January, and only the brief can say which. */
function slashDateWarning(name: string, column: Column, origin: TableOrigin): Diagnostic {
  const sample = column.text.find((t) => t !== null && t !== '')!;
  const yearFirst = /^\d{4}/.test(sample);
  return diagnostic('table.slash-dates', `column \`${name}\` looks like dates written with slashes (${JSON.stringify(sample)}), whose order of day, month and year the data does not say; it is read as text, in no order of time`, {
    file: origin.file, field: name, path: `/fields/${name}`, found: JSON.stringify(sample), expected: 'ISO 8601 dates, or a declared format',
    hint: `declare it: \`fields: { ${name}: { type: temporal, format: "${yearFirst ? '%Y/%m/%d' : '%d/%m/%Y'}" } }\`${yearFirst ? '' : ' (or "%m/%d/%Y" for month first)'}`,
  });
}

function unreadableProblem(name: string, column: Column, cells: RawCell[], unreadable: number[], raw: RawTable, origin: TableOrigin, declared: FieldType | undefined): Diagnostic {
  const rows = unreadable.map((i) => raw.positions[i]!);
  const sample = column.text[unreadable[0]!];
  const allBad = unreadable.length === cells.filter((x) => !isMissingCell(x)).length;
  if (declared && forcedType(declared) && allBad) {
    return diagnostic('table.type-mismatch', `column \`${name}\` is declared ${declared} but none of its cells read as ${typeWord(column.type)}`, {
      file: origin.file, field: name, path: `/fields/${name}/type`, found: JSON.stringify(sample), expected: typeWord(column.type),
      hint: `remove \`fields.${name}.type\` or fix the data`,
    });
  }
  return diagnostic('table.mixed-column', `column \`${name}\` holds ${typeWord(column.type)}, but ${describeRows(rows, raw.positionNoun)} ${agree(rows.length, 'holds', 'hold')} other text (first: ${JSON.stringify(sample)}); ${agree(rows.length, 'that cell is', 'those cells are')} treated as missing`, {
    file: origin.file, field: name, rows, found: JSON.stringify(sample), expected: typeWord(column.type),
    hint: 'fix those cells, or write NA for a missing value',
  });
}

/**
 * Types each column of a raw table: numbers, dates (ISO 8601 or a period spelling such as
 * `Jan 2025`, `2025-Q1`; a temporal field's `format` pattern when given), booleans or text. A
 * field hint's type wins. Slash dates stay text, with a warning, until a format says their order. A column of mostly numbers keeps its numbers and warns about the rest by row. In a
 * semicolon-separated file each numeric column's decimal mark is decided from its cells.
 */
export function inferTable(raw: RawTable, origin: TableOrigin, hints: ReadonlyMap<string, FieldType | undefined>, patterns: ReadonlyMap<string, string> = new Map(), decimals: ReadonlyMap<string, DecimalMark> = new Map()): { table: Table; diagnostics: Diagnostic[] } {
  const diagnostics: Diagnostic[] = [];
  const columns = raw.names.map((name, c) => {
    const cells = raw.rows.map((row) => row[c] ?? null);
    const forced = forcedType(hints.get(name));
    // A decimal mark the brief declares (`fields.<col>.decimal`) is read as declared, in any file.
    const declared = decimals.get(name);
    const reader = declared ? (t: string) => parseNumberText(t, declared) : readerFor(raw, cells, forced, name, origin);
    if (typeof reader !== 'function') diagnostics.push(reader);
    const readNumber = typeof reader === 'function' ? reader : eitherMark;
    let guess = forced ? { type: forced, mixed: false } : guessType(cells, readNumber);
    if (!forced && guess.type === 'number' && yearColumn(name, cells)) {
      guess = { type: 'date', mixed: false };
      diagnostics.push(diagnostic('table.read-as-years', `column \`${name}\` holds whole numbers named as years, so they are read as years on a time axis (1950, not 1,950)`, {
        file: origin.file, field: name, found: 'years written as numbers', expected: 'years', hint: `set \`fields.${name}.type: quantitative\` to treat them as plain numbers`,
      }));
    }
    const pattern = patterns.get(name);
    const { column, unreadable } = buildColumn(name, guess.type, cells, readNumber, pattern === undefined ? readDateText : patternReader(pattern));
    if (!forced && column.type === 'text' && slashDates(column.text)) diagnostics.push(slashDateWarning(name, column, origin));
    if (unreadable.length) diagnostics.push(unreadableProblem(name, column, cells, unreadable, raw, origin, hints.get(name)));
    return column;
  });
  const table: Table = { origin, columns, rowCount: raw.rows.length, rowPositions: raw.positions, positionNoun: raw.positionNoun };
  return { table, diagnostics };
}
