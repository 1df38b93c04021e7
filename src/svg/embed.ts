import { allNodes } from '../scene/walk.js';
import type { Scene } from '../scene/types.js';
import type { Weight } from '../style/types.js';

/** A font face that can be embedded: `file` is its TTF/OTF, cut to the glyphs a chart needs. */
export interface EmbedFace {
  /** Names the face in caches and prebuilt-subset lookups, e.g. "chartwright-sans-regular". */
  key: string;
  /** The CSS family name the SVG gives it. */
  family: string;
  /** CSS font-weight, e.g. 400. */
  weight: number;
  /** Path of the TTF/OTF file. */
  file: string;
}

/**
 * Which face draws which characters of a text at a weight: today one face per weight, later
 * fallback faces for other scripts, each with the characters it has (characters no face has
 * are left out: the browser draws them from its own fonts).
 */
export type FaceProvider = (text: string, weight: Weight) => Array<{ face: EmbedFace; text: string }>;

/** A subset built ahead of time: the face's glyphs in these code point ranges, as WOFF2. */
export interface PrebuiltBlock {
  name: string;
  ranges: ReadonlyArray<readonly [number, number]>;
  /** The WOFF2 bytes (read on first use). */
  data(): Uint8Array;
}

/** Where embedded fonts come from: the faces, their prebuilt blocks, and run-time subsetting. */
export interface EmbedFonts {
  faces: FaceProvider;
  /** The prebuilt blocks of a face ([] when it has none: everything is subset at run time). */
  blocks(face: EmbedFace): readonly PrebuiltBlock[];
  /** A WOFF2 subset of the face holding exactly these characters (deterministic bytes; may be cached). */
  subset(face: EmbedFace, text: string): Promise<Uint8Array>;
}

/** The @font-face rules an SVG carries, and the families to name on its root, in order. */
export interface EmbeddedFonts {
  css: string;
  families: string[];
}

const inRanges = (cp: number, ranges: PrebuiltBlock['ranges']) => ranges.some(([a, b]) => cp >= a && cp <= b);

/** The distinct code points of the drawn text at each weight, in code point order. */
function textByWeight(scene: Scene): Map<Weight, string> {
  const sets = new Map<Weight, Set<number>>();
  for (const node of allNodes([scene.root])) {
    if (node.kind !== 'text') continue;
    const set = sets.get(node.weight) ?? sets.set(node.weight, new Set()).get(node.weight)!;
    for (const ch of node.text) set.add(ch.codePointAt(0)!);
  }
  const out = new Map<Weight, string>();
  for (const weight of [...sets.keys()].sort()) out.set(weight, String.fromCodePoint(...[...sets.get(weight)!].sort((a, b) => a - b)));
  return out;
}

/** A unicode-range descriptor: runs of code points as U+A-B, single ones as U+A. */
export function unicodeRange(ranges: ReadonlyArray<readonly [number, number]>): string {
  const hex = (n: number) => n.toString(16).toUpperCase();
  return ranges.map(([a, b]) => (a === b ? `U+${hex(a)}` : `U+${hex(a)}-${hex(b)}`)).join(',');
}

/** Sorted code points as inclusive runs. */
export function runsOf(codePoints: readonly number[]): Array<[number, number]> {
  const runs: Array<[number, number]> = [];
  for (const cp of codePoints) {
    const last = runs[runs.length - 1];
    if (last && cp === last[1] + 1) last[1] = cp;
    else runs.push([cp, cp]);
  }
  return runs;
}

/** A family name safe inside CSS quotes and XML. */
export const safeFamily = (family: string) => family.replace(/[^A-Za-z0-9 _-]/g, '');

function fontFace(face: EmbedFace, data: Uint8Array, ranges: ReadonlyArray<readonly [number, number]>): string {
  const src = `url(data:font/woff2;base64,${Buffer.from(data.buffer, data.byteOffset, data.byteLength).toString('base64')}) format("woff2")`;
  return `@font-face{font-family:"${safeFamily(face.family)}";font-weight:${face.weight};src:${src};unicode-range:${unicodeRange(ranges)}}`;
}

/** The rules for one face's characters: each prebuilt block they touch, then one run-time subset of the rest. */
async function faceRules(face: EmbedFace, codePoints: readonly number[], fonts: EmbedFonts): Promise<string[]> {
  const rules: string[] = [];
  const blocks = fonts.blocks(face);
  for (const block of blocks) {
    if (codePoints.some((cp) => inRanges(cp, block.ranges))) rules.push(fontFace(face, block.data(), block.ranges));
  }
  const rest = codePoints.filter((cp) => !blocks.some((b) => inRanges(cp, b.ranges)));
  if (rest.length) rules.push(fontFace(face, await fonts.subset(face, String.fromCodePoint(...rest)), runsOf(rest)));
  return rules;
}

/**
 * The fonts a scene's text needs, as @font-face rules with WOFF2 data URIs: for each face the
 * provider picks, the prebuilt blocks its characters fall in, and a subset made now of only the
 * characters outside them. Same scene, same fonts: same text (faces in the order the provider
 * first names them, weights in order, blocks in their order).
 */
export async function embeddedFonts(scene: Scene, fonts: EmbedFonts): Promise<EmbeddedFonts> {
  const faces = new Map<string, { face: EmbedFace; codePoints: Set<number> }>();
  for (const [weight, text] of textByWeight(scene)) {
    for (const part of fonts.faces(text, weight)) {
      const entry = faces.get(part.face.key) ?? faces.set(part.face.key, { face: part.face, codePoints: new Set() }).get(part.face.key)!;
      for (const ch of part.text) entry.codePoints.add(ch.codePointAt(0)!);
    }
  }
  const rules: string[] = [];
  const families: string[] = [];
  for (const { face, codePoints } of faces.values()) {
    if (!families.includes(safeFamily(face.family))) families.push(safeFamily(face.family));
    rules.push(...(await faceRules(face, [...codePoints].sort((a, b) => a - b), fonts)));
  }
  return { css: rules.join('\n'), families };
}
