import { readdirSync, readFileSync } from 'node:fs';
import { readFile } from 'node:fs/promises';
import { createRequire } from 'node:module';
import { dirname, isAbsolute, join, resolve } from 'node:path';
import { diagnostic, failure, type Outcome } from '../diagnostics/diagnostic.js';
import { suggestionHint } from '../diagnostics/suggest.js';
import { createMeasurer, type TextMeasurer } from '../font/measurer.js';
import type { FontMetrics, GlyphOutlines } from '../font/metrics.js';
import type { RenderEnv } from '../pipeline/env.js';
import type { PaletteFile } from '../color/palette.js';
import { resolveStyle } from '../style/resolve.js';
import type { Style, Weight } from '../style/types.js';
import type { OutlineSet } from '../svg/glyphs.js';
import type { TableEnv } from '../table/load.js';
import { packageRoot } from './package-root.js';

/** Style presets shipped in templates/styles. */
export const STYLE_PRESETS = ['report'] as const;

function readJson<T>(path: string): T {
  return JSON.parse(readFileSync(path, 'utf8')) as T;
}

/** Reads stdin to the end. */
async function readAllStdin(): Promise<string> {
  const chunks: Buffer[] = [];
  for await (const c of process.stdin) chunks.push(c as Buffer);
  return Buffer.concat(chunks).toString('utf8');
}

function loadStyle(root: string, name: string, briefFile: string | undefined): Outcome<Style> {
  const isPath = name.includes('/') || name.endsWith('.json');
  const file = isPath ? (isAbsolute(name) || !briefFile ? resolve(name) : resolve(dirname(briefFile), name)) : join(root, 'templates', 'styles', `${name}.json`);
  if (!isPath && !(STYLE_PRESETS as readonly string[]).includes(name)) {
    return failure([diagnostic('brief.style-not-found', `there is no style preset \`${name}\``, { path: '/style', found: name, expected: STYLE_PRESETS.join(', '), hint: suggestionHint(name, STYLE_PRESETS, 'preset') })]);
  }
  let value: unknown;
  try {
    value = readJson(file);
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    return failure([diagnostic(code === 'ENOENT' ? 'brief.style-not-found' : 'brief.bad-style', code === 'ENOENT' ? `the style file \`${name}\` does not exist` : `the style file \`${name}\` is not valid JSON`, { path: '/style', found: file, hint: 'style paths are relative to the brief; presets are named without .json' })]);
  }
  return resolveStyle(value, file, readPalettes(root));
}

/** The palette files shipped in templates/palettes. */
function readPalettes(root: string): PaletteFile[] {
  const dir = join(root, 'templates', 'palettes');
  return readdirSync(dir).filter((f) => f.endsWith('.json')).sort().map((f) => readJson<PaletteFile>(join(dir, f)));
}

/**
 * The environment a Node process renders in: files are read here and nowhere below. Fonts
 * and styles are read once per environment (once per process for the CLI), not per chart.
 */
export function createNodeEnv(root: string = packageRoot()): RenderEnv {
  const fonts = join(root, 'templates', 'fonts');
  const faces: Record<Weight, FontMetrics> = {
    regular: readJson(join(fonts, 'source-sans-3-regular.metrics.json')),
    semibold: readJson(join(fonts, 'source-sans-3-semibold.metrics.json')),
  };
  const measure: TextMeasurer = createMeasurer(faces);
  const styles = new Map<string, Outcome<Style>>();
  let outlines: OutlineSet | undefined;
  const require = createRequire(join(root, 'package.json'));
  const ttf = (face: string) => join(dirname(require.resolve('source-sans/package.json')), 'TTF', face);
  const table: TableEnv = { readText: (p) => readFile(p, 'utf8'), readStdin: readAllStdin };
  return {
    measure,
    table,
    style(name, briefFile) {
      const key = `${name}\u0000${briefFile ?? ''}`;
      if (!styles.has(key)) styles.set(key, loadStyle(root, name, briefFile));
      return styles.get(key)!;
    },
    outlines() {
      outlines ??= {
        family: faces.regular.family,
        outlines: { regular: readJson<GlyphOutlines>(join(fonts, 'source-sans-3-regular.outlines.json')), semibold: readJson<GlyphOutlines>(join(fonts, 'source-sans-3-semibold.outlines.json')) },
        notdef: { regular: faces.regular.notdefOutline, semibold: faces.semibold.notdefOutline },
      };
      return outlines;
    },
    fontFiles: () => [ttf('SourceSans3-Regular.ttf'), ttf('SourceSans3-Semibold.ttf')],
  };
}
