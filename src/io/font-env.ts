import { existsSync, readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { basename, dirname, extname, join, resolve } from 'node:path';
import { diagnostic, failure, success, type Diagnostic, type Outcome } from '../diagnostics/diagnostic.js';
import { FALLBACK_PACKAGES, type FallbackPackage } from '../font/fallback-table.js';
import { bundledRefs, createMeasurer, type TextMeasurer } from '../font/measurer.js';
import { compileFace, type FontMetrics } from '../font/metrics.js';
import { faceFromBytes, type OutsideFace } from '../font/outside-face.js';
import type { FaceSource, StackFace } from '../font/stack-layout.js';
import { createStackMeasurer } from '../font/stack.js';
import type { Style, Weight } from '../style/types.js';

/** Options of the fonts of a Node environment. */
export interface FontEnvOptions {
  /**
   * The folder of an installed npm package, or undefined when it is not installed. Default:
   * resolved from chartwright's own install (which, installed as a dependency, is the
   * consumer's node_modules), then from the working directory.
   */
  findPackage?: (name: string) => string | undefined;
}

/** The fonts of an environment: the default measurer, and one per style that names its own faces. */
export interface FontEnv {
  /** The bundled face, with the fallback packages for characters it lacks. */
  measure: TextMeasurer;
  /** The style with its font paths made absolute, or a coded error for a font file that cannot be read. */
  checkStyle(style: Style, styleFile: string): Outcome<Style>;
  /** The measurer for a (checked) style. */
  measureFor(style: Style): TextMeasurer;
}

/** The folder of an installed package, looked up the way Node would from `from`, without its exports map. */
function packageFolder(name: string, froms: readonly string[]): string | undefined {
  for (const from of froms) {
    const paths = createRequire(from).resolve.paths(name) ?? [];
    for (const dir of paths) if (existsSync(join(dir, name, 'package.json'))) return join(dir, name);
  }
  return undefined;
}

/** A key for glyph ids from a font file name: its base name in lower case, letters, digits and dashes. */
function fileKey(file: string): string {
  return basename(file, extname(file)).toLowerCase().replace(/[^a-z0-9]+/g, '-');
}

function badFont(path: string, file: string, font: string, why: string): Diagnostic {
  return diagnostic('brief.bad-font-file', `the style's font file \`${font}\` cannot be used: ${why}`, {
    path, file, found: font, hint: 'name a TrueType or OpenType font file (.ttf, .otf), relative to the style file',
  });
}

type Opened = OutsideFace | { problem: string };

/** Opens font files once each (per weight), remembering the face or why it cannot be one. */
function fontOpener(): (file: string, weight: Weight, family?: string) => Opened {
  const opened = new Map<string, Opened>();
  return (file, weight, family) => {
    const key = `${weight}\u0000${file}`;
    if (!opened.has(key)) {
      let face: Opened;
      try {
        face = faceFromBytes(readFileSync(file), { key: fileKey(file), weight, file, ...(family ? { family } : {}) });
      } catch (e) {
        const code = (e as NodeJS.ErrnoException).code;
        face = { problem: code === 'ENOENT' ? 'there is no such file' : `it cannot be read (${code ?? (e as Error).message})` };
      }
      opened.set(key, face);
    }
    return opened.get(key)!;
  };
}

/**
 * The fonts of a Node environment. Font files are read and opened with fontkit once per
 * environment, and only when a style names them or a label needs a fallback face.
 */
export function createFontEnv(root: string, metrics: Record<Weight, FontMetrics>, bundledFiles: string[], options: FontEnvOptions = {}): FontEnv {
  const find = options.findPackage ?? ((name: string) => packageFolder(name, [join(root, 'package.json'), join(process.cwd(), 'package.json')]));
  const open = fontOpener();
  const outside = (f: OutsideFace | { problem: string }): StackFace | undefined => ('problem' in f ? undefined : { kind: 'outside', ref: f.ref, face: f });
  const packageSource = (p: FallbackPackage, everyScript: boolean): FaceSource => ({
    serves: (script) => everyScript || p.scripts.includes(script),
    face: (weight) => {
      const dir = find(p.package);
      return dir ? outside(open(join(dir, p.files[weight]), weight, p.family)) : undefined;
    },
  });
  const tableSources = FALLBACK_PACKAGES.map((p) => packageSource(p, false));
  const refs = bundledRefs(metrics, { regular: bundledFiles[0], semibold: bundledFiles[1] });
  const bundled = createMeasurer(metrics, refs);
  const bundledFaces: Record<Weight, StackFace> = {
    regular: { kind: 'bundled', ref: refs.regular, face: compileFace(metrics.regular) },
    semibold: { kind: 'bundled', ref: refs.semibold, face: compileFace(metrics.semibold) },
  };
  const measure = createStackMeasurer({ faces: bundledFaces, bundled }, tableSources);
  const styled = new Map<string, TextMeasurer>();
  const faces: StyleFaces = { open: (file, weight) => outside(open(file, weight)), packageSource, tableSources, bundledFaces, bundled };
  return {
    measure,
    checkStyle: (style, styleFile) => checkStyleFonts(style, styleFile, open),
    measureFor(style) {
      const { files, fallback } = style.font;
      if (!files && !fallback) return measure;
      const key = JSON.stringify([files, fallback]);
      if (!styled.has(key)) styled.set(key, styleMeasurer(style, faces));
      return styled.get(key)!;
    },
  };
}

/** What a style's measurer is built from. */
interface StyleFaces {
  open(file: string, weight: Weight): StackFace | undefined;
  packageSource(p: FallbackPackage, everyScript: boolean): FaceSource;
  tableSources: FaceSource[];
  bundledFaces: Record<Weight, StackFace>;
  bundled: TextMeasurer;
}

/** A checked style's stack: its files (or the bundled face), its fallbacks, then the packages by script. */
function styleMeasurer(style: Style, f: StyleFaces): TextMeasurer {
  const { files, fallback } = style.font;
  const source = (entry: string): FaceSource => {
    const p = FALLBACK_PACKAGES.find((q) => q.package === entry);
    return p ? f.packageSource(p, true) : { serves: () => true, face: (weight) => f.open(entry, weight) };
  };
  const sources = [...(fallback ?? []).map(source), ...f.tableSources];
  if (!files) return createStackMeasurer({ faces: f.bundledFaces, bundled: f.bundled }, sources);
  // checkStyle opened both files before the style reached here, so neither is missing.
  return createStackMeasurer({ faces: { regular: f.open(files.regular, 'regular')!, semibold: f.open(files.bold ?? files.regular, 'semibold')! } }, sources);
}

/** Makes the style's font paths absolute and opens each file once, refusing those that are not fonts. */
function checkStyleFonts(style: Style, styleFile: string, open: (file: string, weight: Weight) => OutsideFace | { problem: string }): Outcome<Style> {
  const { files, fallback } = style.font;
  if (!files && !fallback) return success(style);
  const dir = dirname(styleFile);
  const problems: Diagnostic[] = [];
  const checked = (path: string, font: string, weight: Weight): string => {
    const file = resolve(dir, font);
    const face = open(file, weight);
    if ('problem' in face) problems.push(badFont(path, styleFile, font, face.problem));
    return file;
  };
  const font: Style['font'] = { ...style.font };
  if (files) font.files = { regular: checked('/font/files/regular', files.regular, 'regular'), ...(files.bold ? { bold: checked('/font/files/bold', files.bold, 'semibold') } : {}) };
  if (fallback) font.fallback = fallback.map((entry, i) => (FALLBACK_PACKAGES.some((p) => p.package === entry) ? entry : checked(`/font/fallback/${i}`, entry, 'regular')));
  return problems.length ? failure(problems) : success({ ...style, font });
}
