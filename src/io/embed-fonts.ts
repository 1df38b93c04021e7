import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { join } from 'node:path';
import type { TextMeasurer } from '../font/measurer.js';
import type { Weight } from '../style/types.js';
import type { EmbedFace, EmbedFonts, FaceProvider, PrebuiltBlock } from '../svg/embed.js';

/** templates/fonts/subsets/index.json, as scripts/font-subsets.js writes it. */
interface SubsetIndex {
  family: string;
  blocks: Array<{ name: string; ranges: Array<[number, number]> }>;
  faces: Array<{ weight: Weight; css: number; base: string; blocks: Record<string, { file: string }> }>;
  /** The subsetter options the blocks were cut with; run-time subsets use the same. */
  options: Record<string, unknown>;
}

type SubsetFont = (font: Uint8Array, text: string, options: Record<string, unknown>) => Promise<Uint8Array>;

/**
 * Run-time subsets remembered per environment: a batch whose charts share a rare glyph set cuts
 * it once. Bounded, oldest first out; a subset is a few kB.
 */
export const SUBSET_CACHE_LIMIT = 64;

/** A cache of promises keyed by face and text, dropping the oldest entry beyond the limit. */
export function boundedCache<T>(limit: number): (key: string, make: () => Promise<T>) => Promise<T> {
  const entries = new Map<string, Promise<T>>();
  return (key, make) => {
    const hit = entries.get(key);
    if (hit) return hit;
    const made = make();
    // A failed subset is not remembered: the next chart asking tries again.
    made.catch(() => entries.delete(key));
    entries.set(key, made);
    if (entries.size > limit) entries.delete(entries.keys().next().value!);
    return made;
  };
}

/** The bundled faces: chartwright sans (Source Sans 3, renamed) in regular and semibold. */
function bundledFaces(fonts: string, index: SubsetIndex): Record<Weight, EmbedFace> {
  const face = (weight: Weight): EmbedFace => {
    const f = index.faces.find((x) => x.weight === weight)!;
    return { key: `${index.family}-${weight}`, family: index.family, weight: f.css, file: join(fonts, f.base) };
  };
  return { regular: face('regular'), semibold: face('semibold') };
}

/** A CSS family name of our own for a face other than the bundled one (its file's own name may be reserved by its licence). */
const fallbackFamily = (key: string) => `chartwright-${key.replace(/[^a-z0-9-]/gi, '-')}`;

/**
 * Which face draws which characters, as the measurer decided when it laid the text out: the
 * bundled face's runs go to chartwright sans (prebuilt blocks), every other face's runs (a
 * style's own files, fallback faces for other scripts) to a run-time subset of its file, in a
 * family of its own, so the SVG's family list falls back per character as the measurer did.
 * A face without a file (the bundled face where its package is absent) is left to the blocks.
 */
export function stackProvider(bundled: Record<Weight, EmbedFace>, bundledFamilies: ReadonlySet<string>, measure: TextMeasurer): FaceProvider {
  return (text, weight) => {
    const out: Array<{ face: EmbedFace; text: string }> = [];
    for (const s of measure.segments(text, weight)) {
      if (bundledFamilies.has(s.face.family) || s.face.file === '') {
        const missing = new Set(measure.missing(s.text, weight));
        const has = [...s.text].filter((ch) => !missing.has(ch)).join('');
        if (has) out.push({ face: bundled[weight], text: has });
      } else {
        out.push({ face: { key: s.face.key, family: fallbackFamily(s.face.key), weight: bundled[weight].weight, file: s.face.file }, text: s.text });
      }
    }
    return out;
  };
}

/**
 * Embedded fonts for a Node process: the bundled faces, their prebuilt WOFF2 blocks (read on
 * first use), and run-time subsets of anything else, cut with subset-font (harfbuzz in wasm),
 * which is loaded only when a chart needs a glyph outside the blocks. Run-time subsets are WOFF2:
 * about half the bytes of a TrueType subset (0.9 kB against 2.1 kB for two glyphs, measured),
 * for 15–80 ms of brotli per new glyph set. A static site with a hundred charts serves those
 * bytes to every reader of every page, and pays the time once per build (once per glyph set,
 * with the cache), so bytes win.
 */
export function nodeEmbedFonts(root: string, measure: TextMeasurer, bundledFamilies: ReadonlySet<string>, provider?: FaceProvider): EmbedFonts & { faces: FaceProvider; forMeasure(m: TextMeasurer): EmbedFonts } {
  const fonts = join(root, 'templates', 'fonts');
  const index = JSON.parse(readFileSync(join(fonts, 'subsets', 'index.json'), 'utf8')) as SubsetIndex;
  const faces = bundledFaces(fonts, index);
  const files = new Map<string, Uint8Array>();
  const read = (path: string) => files.get(path) ?? files.set(path, readFileSync(path)).get(path)!;
  const blocks = new Map<string, PrebuiltBlock[]>();
  for (const f of index.faces) {
    blocks.set(faces[f.weight].key, index.blocks.filter((b) => f.blocks[b.name]).map((b) => ({ name: b.name, ranges: b.ranges, data: () => read(join(fonts, f.blocks[b.name]!.file)) })));
  }
  let subsetter: Promise<SubsetFont> | undefined;
  // A runtime dependency, not bundled (it reads its wasm beside itself), loaded only here, on
  // first need; required, not import()ed: bin/ runs the CommonJS bundle in a vm.Script, which
  // has no dynamic import.
  const load = () => (subsetter ??= Promise.resolve().then(() => {
    const require = createRequire(import.meta.url);
    return require('subset-font') as SubsetFont;
  }));
  const cache = boundedCache<Uint8Array>(SUBSET_CACHE_LIMIT);
  // The bundled faces keep only kerning and marks (the measurer applies nothing else); another
  // face keeps harfbuzz's default layout features, since its text was shaped with them (Arabic
  // joining forms, Indic conjuncts): without them a browser draws isolated, wider letters.
  const { keepFeatures: _bundledOnly, ...shaped } = index.options;
  const optionsFor = (face: EmbedFace) => (blocks.has(face.key) ? index.options : shaped);
  const embed: EmbedFonts = {
    faces: provider ?? stackProvider(faces, bundledFamilies, measure),
    blocks: (face) => blocks.get(face.key) ?? [],
    subset: (face, text) => cache(`${face.key}\u0000${face.file}\u0000${text}`, async () => new Uint8Array(await (await load())(read(face.file), text, { ...optionsFor(face), targetFormat: 'woff2' }))),
  };
  return { ...embed, forMeasure: (m: TextMeasurer) => ({ ...embed, faces: stackProvider(faces, bundledFamilies, m) }) };
}
