import { dirname, extname, isAbsolute, join } from 'node:path';
import type { DataSource, FieldHint } from '../brief/types.js';
import { diagnostic, failure, hasErrors, success, type Outcome } from '../diagnostics/diagnostic.js';
import { inferTable } from './infer.js';
import { parseDelimited, parseJsonRows, parseNdjsonRows, rowsFromObjects, type RawTable } from './parse.js';
import type { Table, TableOrigin } from './types.js';

/** What the table stage may touch outside itself. */
export interface TableEnv {
  /** Reads a UTF-8 file; throws a Node error (with `code`) when it cannot. */
  readText(path: string): Promise<string>;
  /** Reads all of standard input. */
  readStdin(): Promise<string>;
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

async function readSource(source: DataSource, briefFile: string | undefined, env: TableEnv): Promise<Outcome<{ text: string; origin: TableOrigin }>> {
  if (source.kind === 'stdin') {
    const text = await env.readStdin();
    return success({ text, origin: { file: '<stdin>', format: sniffFormat(text) } });
  }
  if (source.kind !== 'file') return failure([]);
  const format = FORMATS[extname(source.path).toLowerCase()];
  if (!format) {
    return failure([diagnostic('table.unknown-format', `cannot tell the format of \`${source.path}\` from its extension`, {
      path: '/data', found: extname(source.path) || '(none)', expected: '.csv, .tsv, .json or .ndjson', hint: 'rename the file with one of those extensions',
    })]);
  }
  const full = isAbsolute(source.path) || !briefFile ? source.path : join(dirname(briefFile), source.path);
  try {
    return success({ text: await env.readText(full), origin: { file: full, format } });
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    if (code === 'ENOENT') {
      return failure([diagnostic('table.not-found', `the data file \`${source.path}\` does not exist`, {
        path: '/data', found: full, hint: 'paths in `data:` are relative to the brief file',
      })]);
    }
    return failure([diagnostic('table.unreadable', `the data file \`${source.path}\` cannot be read (${code ?? (e as Error).message})`, { path: '/data', found: full, hint: 'check that it is a readable file, not a folder' })]);
  }
}

/** Type hints from the brief's field section. */
function typeHints(fields: Record<string, FieldHint>): Record<string, FieldHint['type']> {
  return Object.fromEntries(Object.entries(fields).map(([k, v]) => [k, v.type]));
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
  const { table, diagnostics } = inferTable(raw.value, origin, typeHints(fields));
  return hasErrors(diagnostics) ? failure(diagnostics) : success(table, diagnostics);
}
