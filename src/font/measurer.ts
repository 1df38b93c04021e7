import type { Weight } from '../style/types.js';
import { compileFace, layoutRun, missingCharacters, runAdvance, type CompiledFace, type FontMetrics, type PlacedGlyph } from './metrics.js';

/** Measures text in pixels with the metrics of the font that draws it. */
export interface TextMeasurer {
  /** Advance width of one line of text at a font size, in px. */
  width(text: string, size: number, weight: Weight): number;
  /** Distance from baseline up to the font's ascender, in px. */
  ascent(size: number, weight: Weight): number;
  /** Distance from baseline down to the font's descender, in px (positive). */
  descent(size: number, weight: Weight): number;
  /** Characters of the text the font has no glyph for. */
  missing(text: string, weight: Weight): string[];
  /** Glyphs and their x offsets in font units, and the font's units per em. */
  run(text: string, weight: Weight): { glyphs: PlacedGlyph[]; unitsPerEm: number };
}

/** Widths remembered per measurer before the memory is cleared (a batch of charts reuses labels). */
const WIDTH_CACHE_LIMIT = 50_000;

/**
 * A measurer over regular and semibold metrics. Pure: the same text always measures the same;
 * the width cache only saves repeated work.
 */
export function createMeasurer(metrics: Record<Weight, FontMetrics>): TextMeasurer {
  const faces: Record<Weight, CompiledFace> = { regular: compileFace(metrics.regular), semibold: compileFace(metrics.semibold) };
  const cache: Record<Weight, Map<string, number>> = { regular: new Map(), semibold: new Map() };
  const advance = (text: string, weight: Weight) => {
    const memo = cache[weight];
    let a = memo.get(text);
    if (a === undefined) {
      if (memo.size >= WIDTH_CACHE_LIMIT) memo.clear();
      a = runAdvance(faces[weight], text);
      memo.set(text, a);
    }
    return a;
  };
  return {
    width: (text, size, weight) => (advance(text, weight) * size) / faces[weight].metrics.unitsPerEm,
    ascent: (size, weight) => (faces[weight].metrics.ascent * size) / faces[weight].metrics.unitsPerEm,
    descent: (size, weight) => (-faces[weight].metrics.descent * size) / faces[weight].metrics.unitsPerEm,
    missing: (text, weight) => missingCharacters(faces[weight], text),
    run: (text, weight) => ({ glyphs: layoutRun(faces[weight], text), unitsPerEm: faces[weight].metrics.unitsPerEm }),
  };
}
