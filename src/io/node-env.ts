import { closeSync, constants, createReadStream, fstatSync, openSync, readdirSync, readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, isAbsolute, join, resolve } from 'node:path';
import { diagnostic, failure, success, type Outcome } from '../diagnostics/diagnostic.js';
import { suggestionHint } from '../diagnostics/suggest.js';
import type { FontMetrics, GlyphOutlines } from '../font/metrics.js';
import type { RenderEnv } from '../pipeline/env.js';
import type { PaletteFile } from '../color/palette.js';
import { resolveStyle } from '../style/resolve.js';
import type { Style, Weight } from '../style/types.js';
import type { OutlineSet } from '../svg/glyphs.js';
import { nodeEmbedFonts } from './embed-fonts.js';
import { DEFAULT_MAX_DATA_BYTES, type TableEnv } from '../table/load.js';
import { describeBytes, INPUT_LIMITS, readBounded, readUpTo } from './bounded-read.js';
import { createFontEnv, type FontEnvOptions } from './font-env.js';
import { packageRoot } from './package-root.js';

/** Style presets shipped in templates/styles. */
export const STYLE_PRESETS = ['report', 'slide', 'print', 'dark'] as const;

function readJson<T>(path: string): T {
  return JSON.parse(readFileSync(path, 'utf8')) as T;
}

/** Collects a stream's bytes up to `limit`, then stops reading (so /dev/zero ends). */
async function readAtMost(stream: AsyncIterable<Buffer | string>, limit: number): Promise<Uint8Array> {
  const chunks: Buffer[] = [];
  let total = 0;
  for await (const chunk of stream) {
    const bytes = typeof chunk === 'string' ? Buffer.from(chunk) : chunk;
    chunks.push(bytes);
    total += bytes.length;
    if (total >= limit) break; // leaving the loop destroys the stream
  }
  const all = Buffer.concat(chunks);
  return all.subarray(0, Math.min(limit, all.length));
}

/** Largest regular file read in one go; a larger one streams, so a library caller's event loop keeps turning. */
const DIRECT_READ_BYTES = 1 << 20;

/**
 * A data file's bytes, at most `limit`. A small regular file (as fstat says) is read directly:
 * a stream costs a cold CLI run milliseconds to set up. Anything else (a FIFO, a device, a large
 * file) streams and stops at the limit. The file is opened without blocking, so a FIFO with no
 * writer yet cannot stall the open.
 */
async function readFileAtMost(path: string, limit: number): Promise<Uint8Array> {
  const fd = openSync(path, constants.O_RDONLY | (constants.O_NONBLOCK ?? 0));
  try {
    const stat = fstatSync(fd);
    if (stat.isFile() && stat.size <= DIRECT_READ_BYTES) return readUpTo(fd, limit);
  } finally {
    closeSync(fd);
  }
  return readAtMost(createReadStream(path, { highWaterMark: 1 << 20 }), limit);
}

/** The data size limit: CHARTWRIGHT_MAX_DATA_BYTES when it is a positive whole number, else the default. */
function maxDataBytes(): number {
  const set = Number(process.env.CHARTWRIGHT_MAX_DATA_BYTES);
  return Number.isSafeInteger(set) && set > 0 ? set : DEFAULT_MAX_DATA_BYTES;
}

/** Reads data files and stdin as bytes, at most the limit the table stage asks for. */
export function nodeTableEnv(): TableEnv {
  return {
    readBytes: readFileAtMost,
    readStdin: (limit) => readAtMost(process.stdin, limit),
    maxDataBytes: maxDataBytes(),
  };
}

function styleTooLarge(name: string, file: string, limit: number) {
  return failure<Style>([diagnostic('cli.style-too-large', `the style file \`${name}\` is larger than ${describeBytes(limit)}`, {
    path: '/style', found: file, expected: `at most ${describeBytes(limit)}`,
    hint: `a style is a small JSON file; check the path, or raise the limit with ${INPUT_LIMITS.style.variable}=<bytes>`,
  })]);
}

function loadStyle(root: string, name: string, briefFile: string | undefined, maxBytes: number, checkFonts: StyleFontCheck): Outcome<Style> {
  const isPath = name.includes('/') || name.endsWith('.json');
  const file = isPath ? (isAbsolute(name) || !briefFile ? resolve(name) : resolve(dirname(briefFile), name)) : join(root, 'templates', 'styles', `${name}.json`);
  if (!isPath && !(STYLE_PRESETS as readonly string[]).includes(name)) {
    return failure([diagnostic('brief.style-not-found', `there is no style preset \`${name}\``, { path: '/style', found: name, expected: STYLE_PRESETS.join(', '), hint: suggestionHint(name, STYLE_PRESETS, 'preset') })]);
  }
  let value: unknown;
  try {
    // Read at most the limit (plus one byte to notice more): `style: /dev/zero` must not fill memory.
    const read = readBounded(file, maxBytes);
    if (!read.ok) return styleTooLarge(name, file, maxBytes);
    value = JSON.parse(read.text);
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    return failure([diagnostic(code === 'ENOENT' ? 'brief.style-not-found' : 'brief.bad-style', code === 'ENOENT' ? `the style file \`${name}\` does not exist` : `the style file \`${name}\` is not valid JSON`, { path: '/style', found: file, hint: 'style paths are relative to the brief; presets are named without .json' })]);
  }
  // The presets' colours are checked by the test suite (test/cli/styles-and-output.test.ts), not at every start.
  return withFonts(resolveStyle(value, file, readPalettes(root), { trusted: !isPath }), file, checkFonts);
}

/** The palette files shipped in templates/palettes. */
function readPalettes(root: string): PaletteFile[] {
  const dir = join(root, 'templates', 'palettes');
  return readdirSync(dir).filter((f) => f.endsWith('.json')).sort().map((f) => readJson<PaletteFile>(join(dir, f)));
}

/**
 * The Source Sans 3 TTF files, for SVG that still has live text. The font package is a dev
 * dependency (chartwright draws text from the glyph data in templates/fonts/), so an installed
 * chartwright has none: then resvg gets no font files and draws no live text.
 */
function sourceSansFiles(require: NodeJS.Require): string[] {
  let dir: string;
  try {
    dir = dirname(require.resolve('source-sans/package.json'));
  } catch {
    return [];
  }
  return [join(dir, 'TTF', 'SourceSans3-Regular.ttf'), join(dir, 'TTF', 'SourceSans3-Semibold.ttf')];
}

type StyleFontCheck = (style: Style, file: string) => Outcome<Style>;

/** A loaded style with its font files checked (paths made absolute), keeping its warnings. */
function withFonts(loaded: Outcome<Style>, file: string, check: StyleFontCheck): Outcome<Style> {
  if (!loaded.ok) return loaded;
  const checked = check(loaded.value, file);
  return checked.ok ? success(checked.value, loaded.diagnostics) : failure([...loaded.diagnostics, ...checked.diagnostics]);
}

/** Options of a Node environment. */
export interface NodeEnvOptions extends FontEnvOptions {
  /** The largest style file read, in bytes. Default: 256 KiB (`INPUT_LIMITS.style`). */
  maxStyleBytes?: number;
}

/**
 * The environment a Node process renders in: files are read here and nowhere below. Fonts
 * and styles are read once per environment (once per process for the CLI), not per chart.
 */
export function createNodeEnv(root: string = packageRoot(), options: NodeEnvOptions = {}): RenderEnv {
  const fonts = join(root, 'templates', 'fonts');
  const faces: Record<Weight, FontMetrics> = {
    regular: readJson(join(fonts, 'source-sans-3-regular.metrics.json')),
    semibold: readJson(join(fonts, 'source-sans-3-semibold.metrics.json')),
  };
  const styles = new Map<string, Outcome<Style>>();
  let outlines: OutlineSet | undefined;
  let embed: ReturnType<typeof nodeEmbedFonts> | undefined;
  const require = createRequire(join(root, 'package.json'));
  const fontEnv = createFontEnv(root, faces, sourceSansFiles(require), options);
  const table = nodeTableEnv();
  return {
    measure: fontEnv.measure,
    // `this.measure`, so an environment copied with its measurer replaced measures with that one.
    measureFor(style) {
      return style.font.files || style.font.fallback ? fontEnv.measureFor(style) : this.measure;
    },
    table,
    style(name, briefFile) {
      const key = `${name}\u0000${briefFile ?? ''}`;
      if (!styles.has(key)) styles.set(key, loadStyle(root, name, briefFile, options.maxStyleBytes ?? INPUT_LIMITS.style.bytes, fontEnv.checkStyle));
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
    fontFiles: () => sourceSansFiles(require),
    embedFonts(measure) {
      embed ??= nodeEmbedFonts(root, this.measure, new Set([faces.regular.family, faces.semibold.family]));
      return measure && measure !== this.measure ? embed.forMeasure(measure) : embed;
    },
  };
}
