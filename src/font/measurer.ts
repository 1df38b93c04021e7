import type { Weight } from '../style/types.js';
import type { FaceRef } from './outside-face.js';
import { compileFace, layoutRun, missingCharacters, runAdvance, runPositions, runPrevious, type CompiledFace, type FontMetrics, type PlacedGlyph } from './metrics.js';

/**
 * A text measured once: the width of any run of its code points without measuring again, so
 * text can be fitted by searching for a cut instead of re-measuring shorter and shorter pieces.
 */
export interface TextRuler {
  /** Length of the text in code points. */
  readonly length: number;
  /**
   * Width in px of the code points [start, end) set on their own, followed by `suffix` if
   * given: exactly `width()` of that string (for a line longer than WIDTH_CACHE_MAX_TEXT that
   * needs fallback faces, the sum of its code points measured alone: see additiveRuler).
   */
  width(start: number, end: number, suffix?: string): number;
  /** The code point at index i (in code points). */
  codePoint(i: number): number;
  /** The code points [start, end) as a string. */
  slice(start: number, end: number): string;
}

/** Measures text in pixels with the metrics of the font that draws it. */
export interface TextMeasurer {
  /** Advance width of one line of text at a font size, in px. */
  width(text: string, size: number, weight: Weight): number;
  /** The text measured once, code point by code point, for fitting it to a width. */
  ruler(text: string, size: number, weight: Weight): TextRuler;
  /** Distance from baseline up to the font's ascender, in px. */
  ascent(size: number, weight: Weight): number;
  /** Distance from baseline down to the font's descender, in px (positive). */
  descent(size: number, weight: Weight): number;
  /** Characters of the text the font has no glyph for. */
  missing(text: string, weight: Weight): string[];
  /** Glyphs and their x offsets in font units, and the font's units per em. */
  run(text: string, weight: Weight): { glyphs: PlacedGlyph[]; unitsPerEm: number };
  /**
   * The runs of the text in logical order with the face that draws each (per-character
   * fallback): what an SVG that embeds its fonts needs a subset of. Characters no face has go
   * with the first face, which draws them as empty boxes.
   */
  segments(text: string, weight: Weight): Array<{ face: FaceRef; text: string }>;
}

/** Widths remembered per weight before the memory is cleared (a batch of charts reuses labels). */
const WIDTH_CACHE_LIMIT = 50_000;
/**
 * Longest text (UTF-16 units) whose width is remembered: labels repeat, long texts do not, and
 * caching every piece of a 100 kB text once held gigabytes.
 */
export const WIDTH_CACHE_MAX_TEXT = 256;

/** A bounded memory of one computation per text, and how many texts it holds. */
export interface TextMemo {
  get(text: string): number;
  readonly size: number;
}

/**
 * Remembers `compute` for texts of at most WIDTH_CACHE_MAX_TEXT units, and at most
 * WIDTH_CACHE_LIMIT of them (then starts over); longer texts are computed every time.
 */
export function createTextMemo(compute: (text: string) => number): TextMemo {
  const memo = new Map<string, number>();
  return {
    get(text) {
      if (text.length > WIDTH_CACHE_MAX_TEXT) return compute(text);
      let a = memo.get(text);
      if (a === undefined) {
        if (memo.size >= WIDTH_CACHE_LIMIT) memo.clear();
        a = compute(text);
        memo.set(text, a);
      }
      return a;
    },
    get size() {
      return memo.size;
    },
  };
}

function createRuler(face: CompiledFace, text: string, size: number): TextRuler {
  const { x, pen, offsets, length } = runPositions(face, text);
  const toPx = (units: number) => (units * size) / face.metrics.unitsPerEm;
  const codePoint = (i: number) => text.codePointAt(offsets[i]!)!;
  return {
    length,
    width: (start, end, suffix) => {
      const own = end > start ? pen[end]! - x[start]! : 0;
      if (!suffix) return toPx(own);
      return toPx(own + runAdvance(face, suffix, end > start ? runPrevious(face, codePoint(end - 1)) : -1));
    },
    codePoint,
    slice: (start, end) => text.slice(offsets[start], offsets[end]),
  };
}

/** Face references for bundled metrics with no font file known (file ''). */
export function bundledRefs(metrics: Record<Weight, FontMetrics>, files: Partial<Record<Weight, string>> = {}): Record<Weight, FaceRef> {
  const ref = (weight: Weight): FaceRef => ({ key: `${metrics[weight].family}-${weight}`.toLowerCase().replace(/[^a-z0-9]+/g, '-'), family: metrics[weight].family, weight, file: files[weight] ?? '' });
  return { regular: ref('regular'), semibold: ref('semibold') };
}

/**
 * A measurer over regular and semibold metrics. Pure: the same text always measures the same;
 * the width cache only saves repeated work.
 */
export function createMeasurer(metrics: Record<Weight, FontMetrics>, refs: Record<Weight, FaceRef> = bundledRefs(metrics)): TextMeasurer {
  const faces: Record<Weight, CompiledFace> = { regular: compileFace(metrics.regular), semibold: compileFace(metrics.semibold) };
  const cache: Record<Weight, TextMemo> = {
    regular: createTextMemo((text) => runAdvance(faces.regular, text)),
    semibold: createTextMemo((text) => runAdvance(faces.semibold, text)),
  };
  return {
    width: (text, size, weight) => (cache[weight].get(text) * size) / faces[weight].metrics.unitsPerEm,
    ruler: (text, size, weight) => createRuler(faces[weight], text, size),
    ascent: (size, weight) => (faces[weight].metrics.ascent * size) / faces[weight].metrics.unitsPerEm,
    descent: (size, weight) => (-faces[weight].metrics.descent * size) / faces[weight].metrics.unitsPerEm,
    missing: (text, weight) => missingCharacters(faces[weight], text),
    run: (text, weight) => ({ glyphs: layoutRun(faces[weight], text), unitsPerEm: faces[weight].metrics.unitsPerEm }),
    segments: (text, weight) => [{ face: refs[weight], text }],
  };
}
