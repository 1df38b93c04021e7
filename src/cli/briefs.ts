import { readdirSync, statSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { ParsedBrief } from '../brief/parse.js';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import { describeBytes, INPUT_LIMITS, readBounded } from '../io/bounded-read.js';
import { canonicalPath } from './outputs.js';

/** A brief file's text and its parse, read once for both planning and rendering. */
export interface BriefSource {
  text: string;
  parsed: ParsedBrief;
}

/** One brief of a run: its file, or what is wrong with the path that should have given briefs. */
export interface BriefEntry {
  file: string;
  /** Set when the entry stands for a folder that could not be read or held no briefs. */
  problem?: Diagnostic;
}

const BRIEF_NAME = /\.ya?ml$|\.brief\.json$/;

function folderEntries(full: string, list: (dir: string) => string[]): BriefEntry[] {
  let names: string[];
  try {
    names = list(full);
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code ?? 'unknown error';
    return [{ file: full, problem: diagnostic('cli.folder-unreadable', `the folder cannot be read (${code})`, { file: full, hint: 'check the folder\'s permissions; the other briefs were still rendered' }) }];
  }
  const briefs = names.filter((f) => BRIEF_NAME.test(f)).sort().map((f) => ({ file: join(full, f) }));
  if (briefs.length) return briefs;
  return [{ file: full, problem: diagnostic('cli.no-briefs', 'the folder holds no briefs', { file: full, expected: '.yaml, .yml or .brief.json files', hint: 'point at a folder of briefs, or name the brief files' }) }];
}

/**
 * Brief paths from the command line: a folder stands for the briefs in it (.yaml and .yml
 * files, and .brief.json; plain .json is left out, as it may be data), sorted by name. A folder
 * that cannot be read, or holds no briefs, is one failed entry; the rest of the run goes on.
 * A brief reached twice is listed once.
 */
export function expandBriefs(paths: string[], cwd: string, list: (dir: string) => string[] = readdirSync): BriefEntry[] {
  const entries = paths.flatMap((p) => {
    const full = resolve(cwd, p);
    let isDir = false;
    try { isDir = statSync(full).isDirectory(); } catch { /* a missing path is reported as brief.not-found */ }
    return isDir ? folderEntries(full, list) : [{ file: full }];
  });
  // A brief named twice (`briefs/*.yaml briefs/`) is rendered once, not refused as colliding with itself.
  const seen = new Set<string>();
  return entries.filter((e) => {
    const key = canonicalPath(e.file);
    return !seen.has(key) && !!seen.add(key);
  });
}

/**
 * A brief file's text, read without going past the size limit (a `/dev/zero` brief stops
 * there), or the coded error saying why it cannot be had.
 */
export function readBriefFile(file: string, maxBytes: number = INPUT_LIMITS.brief.bytes): { text: string } | { problem: Diagnostic } {
  try {
    const read = readBounded(file, maxBytes);
    if (read.ok) return { text: read.text };
    return { problem: diagnostic('cli.brief-too-large', `the brief file is larger than ${describeBytes(maxBytes)}`, { file, expected: `at most ${describeBytes(maxBytes)}`, hint: `put large data in a data file (data: table.csv), or raise the limit with ${INPUT_LIMITS.brief.variable}=<bytes>` }) };
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    const why = code === 'ENOENT' ? 'the brief file does not exist' : code === 'EISDIR' ? 'this is a folder, not a brief file' : `the brief file cannot be read (${code})`;
    const hint = code === 'EISDIR' ? 'name one brief file here (render and check also take folders of briefs)' : 'check the path; briefs are .yaml, .yml or .json files';
    return { problem: diagnostic('brief.not-found', why, { file, hint }) };
  }
}
