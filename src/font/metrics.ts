/** Metrics of one font face, extracted from its TTF by scripts/font-metrics.js. Units: font units. */
export interface FontMetrics {
  family: string;
  weight: string;
  source: string;
  unitsPerEm: number;
  ascent: number;
  descent: number;
  capHeight: number;
  xHeight: number;
  notdefAdvance: number;
  notdefOutline: string;
  advances: Record<string, number>;
  /** Kerning adjustments for code point pairs, keyed "a,b". */
  kerning: Record<string, number>;
}

/** Glyph outlines as SVG path data in font units (y up), keyed by code point. */
export type GlyphOutlines = Record<string, string>;

/** One glyph placed in a run: its code point (or -1 for .notdef) and x offset in font units. */
export interface PlacedGlyph {
  codePoint: number;
  x: number;
}

/**
 * Lays out a single line of text from cached advances and kerning pairs: the glyphs with their
 * x offsets, and the total advance. No shaping beyond pair kerning: chart labels do not need it.
 */
export function layoutRun(metrics: FontMetrics, text: string): { glyphs: PlacedGlyph[]; advance: number; missing: string[] } {
  const glyphs: PlacedGlyph[] = [];
  const missing: string[] = [];
  let x = 0;
  let previous = -1;
  for (const ch of text) {
    const cp = ch.codePointAt(0)!;
    const advance = metrics.advances[cp];
    if (previous >= 0) x += metrics.kerning[`${previous},${cp}`] ?? 0;
    if (advance === undefined) {
      missing.push(ch);
      glyphs.push({ codePoint: -1, x });
      x += metrics.notdefAdvance;
      previous = -1;
    } else {
      glyphs.push({ codePoint: cp, x });
      x += advance;
      previous = cp;
    }
  }
  return { glyphs, advance: x, missing };
}
