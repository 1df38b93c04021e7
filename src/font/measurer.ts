import type { Weight } from '../style/types.js';
import { layoutRun, type FontMetrics, type PlacedGlyph } from './metrics.js';

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
  /** Glyphs and their x offsets in font units, and the scale from font units to px at a size. */
  run(text: string, weight: Weight): { glyphs: PlacedGlyph[]; unitsPerEm: number };
}

/** A measurer over regular and semibold metrics. Pure: the same text always measures the same. */
export function createMeasurer(faces: Record<Weight, FontMetrics>): TextMeasurer {
  return {
    width: (text, size, weight) => (layoutRun(faces[weight], text).advance * size) / faces[weight].unitsPerEm,
    ascent: (size, weight) => (faces[weight].ascent * size) / faces[weight].unitsPerEm,
    descent: (size, weight) => (-faces[weight].descent * size) / faces[weight].unitsPerEm,
    missing: (text, weight) => layoutRun(faces[weight], text).missing,
    run: (text, weight) => ({ glyphs: layoutRun(faces[weight], text).glyphs, unitsPerEm: faces[weight].unitsPerEm }),
  };
}
