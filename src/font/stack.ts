import type { Weight } from '../style/types.js';
import { createTextMemo, WIDTH_CACHE_MAX_TEXT, type TextMeasurer, type TextMemo, type TextRuler } from './measurer.js';
import { missingCharacters } from './metrics.js';
import { layoutStackLine, stackMissing, unitsPerEm, type FaceSource, type StackFace, type StackLine } from './stack-layout.js';

/** Lines remembered per weight before the memory starts over. */
const LINE_CACHE_LIMIT = 20_000;

/** A ruler that measures each asked-for piece again: for the rare lines set from several faces. */
function sliceRuler(text: string, width: (t: string) => number): TextRuler {
  const chars = [...text];
  return {
    length: chars.length,
    width: (start, end, suffix) => width(chars.slice(start, end).join('') + (suffix ?? '')),
    codePoint: (i) => chars[i]!.codePointAt(0)!,
    slice: (start, end) => chars.slice(start, end).join(''),
  };
}

/**
 * A ruler for a long line set from several faces: each code point measured on its own and
 * summed, so fitting stays linear in the text. Close, not exact: kerning and joining across
 * code points are left out (the exact sliceRuler would measure every piece again: quadratic).
 */
function additiveRuler(text: string, width: (t: string) => number): TextRuler {
  const pen = new Float64Array(text.length + 1);
  const offsets = new Uint32Array(text.length + 1);
  const each = new Map<number, number>();
  let n = 0;
  for (let i = 0; i < text.length; i++, n++) {
    offsets[n] = i;
    const cp = text.codePointAt(i)!;
    if (cp > 0xffff) i++;
    let w = each.get(cp);
    if (w === undefined) each.set(cp, (w = width(String.fromCodePoint(cp))));
    pen[n + 1] = pen[n]! + w;
  }
  offsets[n] = text.length;
  return {
    length: n,
    width: (start, end, suffix) => (end > start ? pen[end]! - pen[start]! : 0) + (suffix ? width(suffix) : 0),
    codePoint: (i) => text.codePointAt(offsets[i]!)!,
    slice: (start, end) => text.slice(offsets[start], offsets[end]),
  };
}

/** The stack's first face for each weight, and for a bundled first face its own (fast) measurer. */
export interface StackPrimary {
  faces: Record<Weight, StackFace>;
  /** The bundled face's measurer: used alone for every line the bundled face draws whole. */
  bundled?: TextMeasurer;
}

/** A face's ascender and descender (negative) in its units. */
function verticalMetrics(f: StackFace): { ascent: number; descent: number } {
  return f.kind === 'bundled' ? f.face.metrics : f.face;
}

/**
 * A measurer over a stack of faces: the first face, then the sources in order, character by
 * character. A line the bundled first face draws whole is measured exactly as before (no
 * fontkit, no bidi); any other line is laid out over the stack once and remembered.
 */
export function createStackMeasurer(primary: StackPrimary, sources: readonly FaceSource[]): TextMeasurer {
  const memo: Record<Weight, Map<string, StackLine>> = { regular: new Map(), semibold: new Map() };
  const line = (text: string, weight: Weight): StackLine => {
    const cached = memo[weight].get(text);
    if (cached) return cached;
    const laid = layoutStackLine(text, primary.faces[weight], sources, weight);
    if (text.length <= WIDTH_CACHE_MAX_TEXT) {
      if (memo[weight].size >= LINE_CACHE_LIMIT) memo[weight].clear();
      memo[weight].set(text, laid);
    }
    return laid;
  };
  const first = primary.faces;
  const bundledWhole = (text: string, weight: Weight): boolean => {
    const f = first[weight];
    return primary.bundled !== undefined && f.kind === 'bundled' && missingCharacters(f.face, text).length === 0;
  };
  const upem = (weight: Weight) => unitsPerEm(first[weight]);
  // Advances in the first face's units, remembered per text: the bundled check runs once per label, not per measurement.
  const units = (weight: Weight) => createTextMemo((text) => (bundledWhole(text, weight) ? primary.bundled!.width(text, upem(weight), weight)
    : text.length > WIDTH_CACHE_MAX_TEXT ? layoutStackLine(text, primary.faces[weight], sources, weight, true).advance : line(text, weight).advance));
  const advance: Record<Weight, TextMemo> = { regular: units('regular'), semibold: units('semibold') };
  const width = (text: string, size: number, weight: Weight) => (advance[weight].get(text) * size) / upem(weight);
  return {
    width,
    ruler: (text, size, weight) => {
      if (bundledWhole(text, weight)) return primary.bundled!.ruler(text, size, weight);
      const measure = (t: string) => width(t, size, weight);
      return text.length <= WIDTH_CACHE_MAX_TEXT ? sliceRuler(text, measure) : additiveRuler(text, measure);
    },
    ascent: (size, weight) => (verticalMetrics(first[weight]).ascent * size) / upem(weight),
    descent: (size, weight) => (-verticalMetrics(first[weight]).descent * size) / upem(weight),
    missing: (text, weight) => (bundledWhole(text, weight) ? [] : stackMissing(text, first[weight], sources, weight)),
    run: (text, weight) => (bundledWhole(text, weight) ? primary.bundled!.run(text, weight) : { glyphs: line(text, weight).glyphs, unitsPerEm: upem(weight) }),
    segments: (text, weight) => (bundledWhole(text, weight) ? [{ face: first[weight].ref, text }] : line(text, weight).segments),
  };
}
