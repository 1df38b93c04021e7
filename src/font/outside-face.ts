import { createRequire } from 'node:module';
import type { Font } from 'fontkit';
import type { Weight } from '../style/types.js';

/** A face a text run is drawn from: what the SVG writer needs to embed a subset of it. */
export interface FaceRef {
  /** A stable id naming the face in glyph ids and embedded subsets (letters, digits and dashes). */
  key: string;
  family: string;
  weight: Weight;
  /** The TTF/OTF file ('' for the bundled face where its package is not installed). */
  file: string;
}

/** One glyph of a shaped run, in the face's units, in visual order. */
export interface ShapedGlyph {
  id: number;
  x: number;
  y: number;
}

/** A font file read with fontkit: shaped (OpenType GSUB/GPOS, Arabic joining) and drawn by glyph id. */
export interface OutsideFace {
  ref: FaceRef;
  unitsPerEm: number;
  ascent: number;
  descent: number;
  has(cp: number): boolean;
  /** The text shaped as one run, glyphs in visual order (a right-to-left run comes out reversed). */
  shape(text: string, rtl: boolean): { glyphs: ShapedGlyph[]; advance: number };
  /** A glyph's outline as SVG path data in font units, y up. */
  path(id: number): string;
}

type Fontkit = typeof import('fontkit');
let fontkit: Fontkit | undefined;

/**
 * fontkit, loaded on first use only: the bundled face never needs it, and loading it costs a
 * cold process about 110 ms. External to the bundle (scripts/build.js), like resvg.
 */
function loadFontkit(): Fontkit {
  const require = createRequire(import.meta.url);
  fontkit ??= require('fontkit') as Fontkit;
  return fontkit;
}

/** A face from a font file's bytes, or the reason it cannot be one (not a font, a collection). */
export function faceFromBytes(bytes: Uint8Array, ref: Omit<FaceRef, 'family'> & { family?: string }): OutsideFace | { problem: string } {
  let font: Font;
  try {
    const opened = loadFontkit().create(Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength));
    if (!('unitsPerEm' in opened) || !('layout' in opened)) return { problem: 'it is a font collection; name one font file (TTF or OTF)' };
    font = opened;
    if (!(font.unitsPerEm > 0) || font.numGlyphs < 1) return { problem: 'it has no glyphs' };
  } catch (e) {
    return { problem: `it is not a font fontkit can read (${(e as Error).message})` };
  }
  return wrapFont(font, { ...ref, family: ref.family ?? font.familyName });
}

function wrapFont(font: Font, ref: FaceRef): OutsideFace {
  const paths = new Map<number, string>();
  const shapes = new Map<string, { glyphs: ShapedGlyph[]; advance: number }>();
  return {
    ref,
    unitsPerEm: font.unitsPerEm,
    ascent: font.ascent,
    descent: font.descent,
    has: (cp) => font.hasGlyphForCodePoint(cp),
    shape(text, rtl) {
      const key = `${rtl ? 'r' : 'l'}${text}`;
      let shaped = shapes.get(key);
      if (!shaped) {
        shaped = shapeRun(font, text, rtl);
        if (shapes.size > 10_000) shapes.clear();
        shapes.set(key, shaped);
      }
      return shaped;
    },
    path(id) {
      let d = paths.get(id);
      if (d === undefined) {
        d = font.getGlyph(id).path.toSVG();
        paths.set(id, d);
      }
      return d;
    },
  };
}

function shapeRun(font: Font, text: string, rtl: boolean): { glyphs: ShapedGlyph[]; advance: number } {
  // fontkit shapes with the script's own features (Arabic joining, marks) and returns a
  // right-to-left run reversed, in the order it is drawn.
  const run = font.layout(text, undefined, undefined, undefined, rtl ? 'rtl' : 'ltr');
  const glyphs: ShapedGlyph[] = [];
  let x = 0;
  for (let i = 0; i < run.glyphs.length; i++) {
    const p = run.positions[i]!;
    glyphs.push({ id: run.glyphs[i]!.id, x: x + p.xOffset, y: p.yOffset });
    x += p.xAdvance;
  }
  return { glyphs, advance: x };
}
