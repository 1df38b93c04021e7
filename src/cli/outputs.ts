import { existsSync, realpathSync } from 'node:fs';
import { basename, dirname, extname, isAbsolute, join, relative, resolve, sep } from 'node:path';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';

/** A file to write: where, and what. */
export interface PlannedFile {
  path: string;
  kind: 'svg' | 'png' | 'scene' | 'alt' | 'data';
}

/** Where a brief's outputs may go. */
export interface OutputRules {
  /** Outputs go under this folder instead of beside the brief (-o). */
  outDir?: string;
  /** Add a PNG beside every SVG (--png). */
  png: boolean;
  /** Let `output:` name files outside the brief's folder or -o, and absolute paths (--allow-outside). Default: false. */
  allowOutside?: boolean;
  /** Add the alt text as a .txt beside every SVG (--alt). Default: false. */
  alt?: boolean;
  /** Add the numbers drawn as a .csv beside every SVG (--data). Default: false. */
  data?: boolean;
}

/** The extensions an `output:` may have. */
export const OUTPUT_EXTENSIONS = ['.svg', '.png'] as const;

/** True when `path` is `base` or lies under it. */
export function isInside(path: string, base: string): boolean {
  const rel = relative(base, path);
  return rel === '' || (!rel.startsWith(`..${sep}`) && rel !== '..' && !isAbsolute(rel));
}

/**
 * A path with symbolic links resolved as far as it exists: the real path of its nearest
 * existing ancestor, with the rest appended. Two spellings of one file compare equal, and a
 * linked folder that leads elsewhere is seen for where it leads.
 */
export function canonicalPath(path: string): string {
  const rest: string[] = [];
  let at = resolve(path);
  while (!existsSync(at) && dirname(at) !== at) {
    rest.unshift(basename(at));
    at = dirname(at);
  }
  try {
    return join(realpathSync(at), ...rest);
  } catch {
    return resolve(path);
  }
}

function badName(name: string): string | undefined {
  if (name.trim() === '' || name === '.' || name === '..') return 'it names no file';
  if (/[/\\]$/.test(name)) return 'it ends in a folder separator, so it names a folder';
  if (['.', '..'].includes(basename(name))) return 'it names a folder';
  if (/[\u0000-\u001f\u007f]/.test(name)) return 'it contains control characters';
  return undefined;
}

/** Checks one `output:` name; returns the file's full path or the problem with it. */
function checkOutput(name: string, at: string, base: string, rules: OutputRules): { path: string } | { problem: Diagnostic } {
  const why = badName(name);
  if (why) return { problem: diagnostic('output.bad-name', `the output \`${name}\` is not a file name: ${why}`, { path: at, found: name, expected: 'a file name such as figures/chart.svg', hint: 'name the file, e.g. `output: figures/chart.svg`' }) };
  const ext = extname(name).toLowerCase();
  if (!(OUTPUT_EXTENSIONS as readonly string[]).includes(ext)) {
    return { problem: diagnostic('output.bad-extension', `chartwright cannot write \`${name}\`: outputs are ${OUTPUT_EXTENSIONS.join(' or ')}`, { path: at, found: ext || '(no extension)', expected: OUTPUT_EXTENSIONS.join(', '), hint: `name the output with .svg or .png, e.g. \`${name.slice(0, name.length - extname(name).length) || 'chart'}.svg\`` }) };
  }
  const path = isAbsolute(name) ? resolve(name) : resolve(base, name);
  if (rules.allowOutside) return { path };
  const where = rules.outDir ? 'the -o folder' : 'the brief\'s folder';
  if (isAbsolute(name) || !isInside(path, base) || !isInside(canonicalPath(dirname(path)), canonicalPath(base))) {
    return { problem: diagnostic('output.outside', `the output \`${name}\` would be written outside ${where}`, { path: at, found: path, expected: `a path under ${base}`, hint: 'name a file under the brief\'s folder (or -o DIR), or pass --allow-outside to write elsewhere on purpose' }) };
  }
  return { path };
}

/** The SVG of an output name, the PNG beside it when the name is .png or `png` is set, and the alt text and data beside it when asked for. */
function filesFor(path: string, rules: OutputRules): PlannedFile[] {
  const stem = path.slice(0, path.length - extname(path).length);
  const files: PlannedFile[] = [{ path: `${stem}.svg`, kind: 'svg' }];
  if (extname(path).toLowerCase() === '.png' || rules.png) files.push({ path: `${stem}.png`, kind: 'png' });
  if (rules.alt) files.push({ path: `${stem}.txt`, kind: 'alt' });
  // .data.csv, not .csv: a brief's own data file is usually named like the brief (piers.yaml reads piers.csv).
  if (rules.data) files.push({ path: `${stem}.data.csv`, kind: 'data' });
  return files;
}

/**
 * The files one brief renders to, or the problems with its `output:` names. The brief's
 * `output` names them (relative to the brief, or to `outDir`); by default the brief's own name
 * with .svg. The SVG is always written; a .png output or `png` adds the PNG beside it under the
 * same name, and `alt` and `data` a .txt and a .data.csv. Names must stay under the brief's folder (or `outDir`) unless `allowOutside`.
 */
export function plannedOutputs(briefFile: string, outputs: string[], rules: OutputRules): { files: PlannedFile[]; problems: Diagnostic[] } {
  const base = resolve(rules.outDir ?? dirname(briefFile));
  // The default name comes from the brief's own file name, which needs no checking.
  if (!outputs.length) return { files: filesFor(join(base, `${basename(briefFile, extname(briefFile))}.svg`), rules), problems: [] };
  const files = new Map<string, PlannedFile>();
  const problems: Diagnostic[] = [];
  for (const [i, name] of outputs.entries()) {
    const checked = checkOutput(name, outputs.length > 1 ? `/output/${i}` : '/output', base, rules);
    if ('problem' in checked) { problems.push(checked.problem); continue; }
    for (const f of filesFor(checked.path, rules)) files.set(f.path, f);
  }
  return { files: problems.length ? [] : [...files.values()], problems };
}
