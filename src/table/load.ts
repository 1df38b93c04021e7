import { dirname, extname, isAbsolute, join } from 'node:path';
import type { DataSource, FieldHint } from '../brief/types.js';
import { diagnostic, failure, hasErrors, success, type Outcome } from '../diagnostics/diagnostic.js';
import { datePatterns } from './date-format.js';
import { decodeTable } from './decode.js';
import { inferTable } from './infer.js';
import { parseDelimited, parseJsonRows, parseNdjsonRows, rowsFromObjects, type RawTable } from './parse.js';
import type { Table, TableOrigin } from './types.js';

/**
 * Largest data file or stdin read, in bytes: 256 MiB. Kept under V8's longest string (about
 * 512 Mi UTF-16 units), so any data that fits also decodes. Raised with CHARTWRIGHT_MAX_DATA_BYTES.
 */
export const DEFAULT_MAX_DATA_BYTES = 256 * 1024 * 1024;

/** What the table stage may touch outside itself. */
export interface TableEnv {
  /**
   * Reads the bytes of a file, at most `limit` of them, so that an endless file such as
   * /dev/zero stops; throws a Node error (with `code`) when it cannot.
   */
  readBytes(path: string, limit: number): Promise<Uint8Array>;
  /** Reads standard input to its end, or to at most `limit` bytes. */
  readStdin(limit: number): Promise<Uint8Array>;
  /** The largest data file or stdin accepted, in bytes. Default: `DEFAULT_MAX_DATA_BYTES`. */
  maxDataBytes?: number;
}

const FORMATS: Record<string, TableOrigin['format']> = {
  '.csv': 'csv', '.tsv': 'tsv', '.tab': 'tsv', '.json': 'json', '.ndjson': 'ndjson', '.jsonl': 'ndjson',
};

/** Guesses the format of text from stdin by its first characters. */
export function sniffFormat(text: string): TableOrigin['format'] {
  const head = text.replace(/^\uFEFF/, '').trimStart();
  if (head.startsWith('[')) return 'json';
  if (head.startsWith('{')) return 'ndjson';
  const firstLine = head.split(/\r?\n/, 1)[0] ?? '';
  return firstLine.includes('\t') ? 'tsv' : 'csv';
}

/** Parses table text of a known format into a raw table. */
export function parseTableText(text: string, origin: TableOrigin): Outcome<RawTable> {
  if (origin.format === 'json') return parseJsonRows(text, origin);
  if (origin.format === 'ndjson') return parseNdjsonRows(text, origin);
  return parseDelimited(text, origin);
}

function tooLarge(file: string, limit: number): Outcome<never> {
  return failure([diagnostic('table.too-large', `the data in \`${file}\` is larger than the limit of ${limit} bytes`, {
    path: '/data', file, found: `more than ${limit} bytes`, expected: `at most ${limit} bytes`,
    hint: 'set the environment variable CHARTWRIGHT_MAX_DATA_BYTES to a larger number of bytes, or chart a smaller extract',
  })]);
}

/** Decodes read bytes, refusing more than the limit (the reader was asked for one byte more). */
function decodeRead(bytes: Uint8Array, file: string, limit: number): Outcome<string> {
  if (bytes.length > limit) return tooLarge(file, limit);
  try {
    return decodeTable(bytes, file);
  } catch {
    return tooLarge(file, limit); // longer than the longest string V8 can hold
  }
}

function unreadable(e: unknown, source: { path: string }, full: string): Outcome<never> {
  const code = (e as NodeJS.ErrnoException | undefined)?.code;
  if (code === 'ENOENT') {
    return failure([diagnostic('table.not-found', `the data file \`${source.path}\` does not exist`, {
      path: '/data', found: full, hint: 'paths in `data:` are relative to the brief file',
    })]);
  }
  return failure([diagnostic('table.unreadable', `the data file \`${source.path}\` cannot be read (${code ?? (e as Error)?.message ?? String(e)})`, { path: '/data', found: full, hint: 'check that it is a readable file, not a folder' })]);
}

async function readSource(source: DataSource, briefFile: string | undefined, env: TableEnv): Promise<Outcome<{ text: string; origin: TableOrigin }>> {
  const limit = env.maxDataBytes ?? DEFAULT_MAX_DATA_BYTES;
  if (source.kind === 'stdin') {
    let bytes: Uint8Array;
    try {
      bytes = await env.readStdin(limit + 1);
    } catch (e) {
      return unreadable(e, { path: '-' }, '<stdin>');
    }
    const text = decodeRead(bytes, '<stdin>', limit);
    return text.ok ? success({ text: text.value, origin: { file: '<stdin>', format: sniffFormat(text.value) } }) : failure(text.diagnostics);
  }
  if (source.kind !== 'file') return failure([]);
  const format = FORMATS[extname(source.path).toLowerCase()];
  if (!format) {
    return failure([diagnostic('table.unknown-format', `cannot tell the format of \`${source.path}\` from its extension`, {
      path: '/data', found: extname(source.path) || '(none)', expected: '.csv, .tsv, .json or .ndjson', hint: 'rename the file with one of those extensions',
    })]);
  }
  const full = isAbsolute(source.path) || !briefFile ? source.path : join(dirname(briefFile), source.path);
  let bytes: Uint8Array;
  try {
    bytes = await env.readBytes(full, limit + 1);
  } catch (e) {
    return unreadable(e, source, full);
  }
  const text = decodeRead(bytes, full, limit);
  return text.ok ? success({ text: text.value, origin: { file: full, format } }) : failure(text.diagnostics);
}

/** Type hints from the brief's field section, by own column name only (a column may be named `constructor`). */
function typeHints(fields: Record<string, FieldHint>): Map<string, FieldHint['type']> {
  return new Map(Object.entries(fields).map(([k, v]) => [k, v?.type]));
}

/** Decimal marks the brief declares for its columns (`fields.<col>.decimal`). */
function decimalMarks(fields: Record<string, FieldHint>): Map<string, ',' | '.'> {
  return new Map(Object.entries(fields).flatMap(([k, v]) => (v?.decimal ? [[k, v.decimal] as [string, ',' | '.']] : [])));
}

/**
 * The table stage: a data source (file relative to the brief, stdin, or inline rows) → a typed,
 * columnar `Table`. Every coded error names the file and line.
 */
export async function readTable(source: DataSource, fields: Record<string, FieldHint>, briefFile: string | undefined, env: TableEnv): Promise<Outcome<Table>> {
  let raw: Outcome<RawTable>;
  let origin: TableOrigin;
  if (source.kind === 'rows') {
    origin = { file: '<rows>', format: 'rows' };
    raw = rowsFromObjects(source.rows, source.rows.map((_, i) => i + 1), 'row', origin);
  } else {
    const read = await readSource(source, briefFile, env);
    if (!read.ok) return failure(read.diagnostics);
    origin = read.value.origin;
    raw = parseTableText(read.value.text, origin);
  }
  if (!raw.ok) return failure(raw.diagnostics);
  const { table, diagnostics } = inferTable(raw.value, origin, typeHints(fields), datePatterns(fields), decimalMarks(fields));
  return hasErrors(diagnostics) ? failure(diagnostics) : success(table, diagnostics);
}
