import { csvParseRows, dsvFormat, tsvParseRows } from 'd3-dsv';
import { describeRows, diagnostic, failure, success, type Diagnostic, type Outcome } from '../diagnostics/diagnostic.js';
import type { TableOrigin } from './types.js';
import { agree, article, count } from '../diagnostics/words.js';

/** A raw cell before typing: text from delimited files, or a JSON scalar. */
export type RawCell = string | number | boolean | null;

/** Rows of raw cells under named columns, with each row's source position. */
export interface RawTable {
  names: string[];
  rows: RawCell[][];
  positions: number[];
  positionNoun: 'line' | 'row';
  /** The character between cells, for delimited text. */
  separator?: string;
}

const QUOTE = 34;
const NEWLINE = 10;
const RETURN = 13;

/**
 * 1-based line on which each record of delimited text starts, read the way d3-dsv (and RFC
 * 4180) reads records: a quote opens a quoted field only at the start of a field, so a stray
 * quote inside an unquoted cell is plain text; a quoted field may span lines; CR LF, LF and a
 * lone CR each end a line.
 */
export function recordStartLines(text: string, delimiter = ','): number[] {
  const starts: number[] = [];
  const sep = delimiter.charCodeAt(0);
  let n = text.length;
  if (text.charCodeAt(n - 1) === NEWLINE) n--;
  if (text.charCodeAt(n - 1) === RETURN) n--;
  let line = 1;
  let i = 0;
  // Consumes a line break at i, if there is one; true when it did.
  const lineBreak = (): boolean => {
    const c = text.charCodeAt(i);
    if (c !== NEWLINE && c !== RETURN) return false;
    i += c === RETURN && text.charCodeAt(i + 1) === NEWLINE ? 2 : 1;
    line++;
    return true;
  };
  let recordStart = true;
  while (i < n) {
    if (recordStart) starts.push(line);
    recordStart = false;
    if (text.charCodeAt(i) === QUOTE) {
      for (i++; i < n; ) {
        if (text.charCodeAt(i) === QUOTE) {
          if (text.charCodeAt(i + 1) !== QUOTE) break;
          i += 2;
        } else if (!lineBreak()) i++;
      }
      i++; // past the closing quote; d3-dsv then takes one character, and only a line break ends the record
      if (i < n) {
        if (lineBreak()) recordStart = true;
        else i++;
      }
      continue;
    }
    while (i < n && !recordStart) {
      if (lineBreak()) recordStart = true;
      else if (text.charCodeAt(i++) === sep) break;
    }
  }
  return starts;
}

function checkHeader(names: string[], origin: TableOrigin, headerLine: number): Diagnostic[] {
  const problems: Diagnostic[] = [];
  const seen = new Map<string, number>();
  names.forEach((name, i) => {
    if (name.trim() === '') {
      problems.push(diagnostic('table.empty-column-name', `column ${i + 1} of the header has no name`, {
        file: origin.file, line: headerLine, hint: 'give every column a name in the header row',
      }));
    } else if (seen.has(name)) {
      problems.push(diagnostic('table.duplicate-column', `the column name \`${name}\` appears twice in the header (columns ${seen.get(name)! + 1} and ${i + 1})`, {
        file: origin.file, line: headerLine, found: name, hint: 'rename one of the columns so each name is unique',
      }));
    } else seen.set(name, i);
  });
  return problems;
}

/**
 * Whether a .csv file separates cells with semicolons, as spreadsheets in locales with a decimal
 * comma write it: its header line has semicolons and no commas.
 */
export function usesSemicolons(text: string): boolean {
  const header = text.split(/\r?\n/, 1)[0] ?? '';
  return header.includes(';') && !header.includes(',');
}

/** Parses CSV (comma or semicolon) or TSV text with d3-dsv into a raw table; the first record is the header. */
export function parseDelimited(text: string, origin: TableOrigin): Outcome<RawTable> {
  const body = text.replace(/^\uFEFF/, '');
  if (body.trim() === '') {
    return failure([diagnostic('table.empty', 'the data file is empty', { file: origin.file, hint: 'add a header row and at least one data row' })]);
  }
  const separator = origin.format === 'tsv' ? '\t' : usesSemicolons(body) ? ';' : ',';
  const records = separator === '\t' ? tsvParseRows(body) : separator === ';' ? dsvFormat(';').parseRows(body) : csvParseRows(body);
  const lines = recordStartLines(body, separator);
  const kept = records.map((r, i) => ({ r, line: lines[i] ?? i + 1 })).filter(({ r }) => !(r.length === 1 && r[0]!.trim() === ''));
  const [header, ...data] = kept;
  if (!header) return failure([diagnostic('table.empty', 'the data file is empty', { file: origin.file, hint: 'add a header row and at least one data row' })]);
  const names = header.r.map((n) => n.trim());
  const headerProblems = checkHeader(names, origin, header.line);
  if (headerProblems.length) return failure(headerProblems);
  if (data.length === 0) {
    return failure([diagnostic('table.header-only', 'the data file has a header but no data rows', { file: origin.file, line: header.line, hint: 'add at least one row of data under the header' })]);
  }
  const ragged = data.filter(({ r }) => r.length !== names.length);
  if (ragged.length) {
    const first = ragged[0]!;
    return failure([diagnostic('table.ragged-row', `${describeRows(ragged.map((x) => x.line))} ${agree(ragged.length, 'has', 'have')} a different number of cells from the header`, {
      file: origin.file, line: first.line, rows: ragged.map((x) => x.line), found: count(first.r.length, 'cell'), expected: `${count(names.length, 'cell')}, as in the header`,
      hint: origin.format === 'csv' ? 'quote cells that contain commas, e.g. "Smith, J."' : 'check for missing or extra tabs on these lines',
    })]);
  }
  return success({ names, rows: data.map(({ r }) => r), positions: data.map(({ line }) => line), positionNoun: 'line', separator });
}

/**
 * A few words on a value that is no table cell, for `found`. Bounded work and never an
 * exception, unlike JSON.stringify: the value may be a BigInt, circular, or nested 100,000 deep.
 */
function describeValue(value: unknown): string {
  try {
    if (Array.isArray(value)) return `a list of ${count(value.length, 'item')}`;
    if (value !== null && typeof value === 'object') {
      const keys = Object.keys(value);
      return keys.length ? `an object with ${keys.slice(0, 3).map((k) => JSON.stringify(k.slice(0, 20))).join(', ')}${keys.length > 3 ? ', …' : ''}` : 'an empty object';
    }
    if (typeof value === 'string') return JSON.stringify(value.length > 40 ? `${value.slice(0, 40)}…` : value);
    return typeof value === 'function' || typeof value === 'symbol' ? article(typeof value) : String(value);
  } catch {
    return 'a value that cannot be read'; // a getter or proxy that throws
  }
}

function isDate(value: unknown): value is Date {
  // By tag, not instanceof: a Date made in another realm (a vm context, a worker) is still a Date.
  return Object.prototype.toString.call(value) === '[object Date]';
}

/**
 * A `Date` handed to the library as a cell, written as the ISO 8601 text the table reads as a
 * date, in UTC: the day alone at midnight UTC (so its grain is the day), otherwise to the
 * millisecond. An invalid Date is a missing cell, as NaN is.
 */
export function dateCell(value: Date): string | null {
  const time = value.getTime();
  if (!Number.isFinite(time)) return null;
  const iso = value.toISOString();
  // Years past 9999 or before 0 are written with a sign and six digits; they keep the full form.
  return time % 86_400_000 === 0 && /^\d{4}-/.test(iso) ? iso.slice(0, 10) : iso.replace('.000Z', 'Z');
}

function scalarOrProblem(value: unknown, name: string, origin: TableOrigin, position: number, noun: 'line' | 'row'): RawCell | Diagnostic {
  if (value === null || value === undefined) return null;
  if (typeof value === 'string' || typeof value === 'boolean' || typeof value === 'number') return value;
  // A BigInt is a number the library was handed; beyond about 1.8e308 it reads as infinite, so missing.
  if (typeof value === 'bigint') return Number(value);
  if (isDate(value)) return dateCell(value);
  const what = Array.isArray(value) ? 'a list' : article(typeof value);
  return diagnostic('table.nested-value', `${noun} ${position}, column \`${name}\` holds ${what}`, {
    file: origin.file, ...(noun === 'line' ? { line: position } : {}), rows: [position], field: name, found: describeValue(value), expected: 'a number, string, boolean or null',
    hint: 'flatten nested values into their own columns before charting',
  });
}

/** Turns row objects (from JSON, NDJSON or inline rows) into a raw table with the union of their keys. */
export function rowsFromObjects(items: unknown[], positions: number[], noun: 'line' | 'row', origin: TableOrigin): Outcome<RawTable> {
  if (items.length === 0) {
    return failure([diagnostic('table.empty', 'the data has no rows', { file: origin.file, hint: 'give at least one row object' })]);
  }
  const names: string[] = [];
  const seen = new Set<string>();
  const problems: Diagnostic[] = [];
  items.forEach((item, i) => {
    if (item === null || typeof item !== 'object' || Array.isArray(item)) {
      problems.push(diagnostic('table.row-not-an-object', `${noun} ${positions[i]} is not an object`, {
        file: origin.file, ...(noun === 'line' ? { line: positions[i] } : {}), rows: [positions[i]!], found: Array.isArray(item) ? 'a list' : describeValue(item),
        expected: 'an object such as {"pier": "North", "crossings": 212}', hint: 'write each row as an object keyed by column name',
      }));
      return;
    }
    for (const key of Object.keys(item)) if (!seen.has(key)) { seen.add(key); names.push(key); }
  });
  if (problems.length) return failure(problems);
  const rows = items.map((item, i) => names.map((name) => {
    // Own properties only: a row without `constructor` must not read Object.prototype's.
    const value = Object.hasOwn(item as object, name) ? (item as Record<string, unknown>)[name] : undefined;
    const cell = scalarOrProblem(value, name, origin, positions[i]!, noun);
    if (cell !== null && typeof cell === 'object') { problems.push(cell); return null; }
    return cell;
  }));
  if (problems.length) return failure(problems);
  return success({ names, rows, positions, positionNoun: noun });
}

/** Parses a JSON array of row objects. */
export function parseJsonRows(text: string, origin: TableOrigin): Outcome<RawTable> {
  if (text.trim() === '') return failure([diagnostic('table.empty', 'the data file is empty', { file: origin.file, hint: 'write a JSON array of row objects' })]);
  let value: unknown;
  try {
    value = JSON.parse(text.replace(/^\uFEFF/, ''));
  } catch (e) {
    return failure([diagnostic('table.bad-json', `the data file is not valid JSON: ${(e as Error).message}`, { file: origin.file, hint: 'check for trailing commas and unquoted names' })]);
  }
  if (!Array.isArray(value)) {
    return failure([diagnostic('table.not-an-array', 'the JSON data is not an array of rows', {
      file: origin.file, found: value === null ? 'null' : typeof value, expected: 'an array such as [{"pier": "North", "crossings": 212}]', hint: 'wrap the rows in [ ]; for one object per line use an .ndjson file',
    })]);
  }
  return rowsFromObjects(value, value.map((_, i) => i + 1), 'row', origin);
}

/** Parses newline-delimited JSON: one row object per line; blank lines are skipped. */
export function parseNdjsonRows(text: string, origin: TableOrigin): Outcome<RawTable> {
  const items: unknown[] = [];
  const positions: number[] = [];
  const lines = text.replace(/^\uFEFF/, '').split(/\r?\n/);
  for (let i = 0; i < lines.length; i++) {
    const line = lines[i]!;
    if (line.trim() === '') continue;
    try {
      items.push(JSON.parse(line));
      positions.push(i + 1);
    } catch (e) {
      return failure([diagnostic('table.bad-json', `line ${i + 1} is not valid JSON: ${(e as Error).message}`, { file: origin.file, line: i + 1, hint: 'write one complete JSON object per line' })]);
    }
  }
  return rowsFromObjects(items, positions, 'line', origin);
}
