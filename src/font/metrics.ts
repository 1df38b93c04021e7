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
  /** Advance widths as a flat list: code point, advance, code point, advance, … */
  advances: number[];
  /** Kerning adjustments as a flat list: first code point, second code point, adjustment, … */
  kerning: number[];
}

/** Glyph outlines as SVG path data in font units (y up), keyed by code point. */
export type GlyphOutlines = Record<string, string>;

/** One glyph placed in a run: its code point (or -1 for .notdef) and x offset in font units. */
export interface PlacedGlyph {
  codePoint: number;
  x: number;
}

/** A face's metrics in lookup form: numeric keys, built once per face. */
export interface CompiledFace {
  metrics: FontMetrics;
  advances: Map<number, number>;
  /** Kerning by pair key `a * PAIR + b`. */
  kerning: Map<number, number>;
}

/** Multiplier making a unique number of a code point pair (above the largest code point). */
const PAIR = 0x110000;

/** Builds the lookup form of a face's metrics. */
export function compileFace(metrics: FontMetrics): CompiledFace {
  const advances = new Map<number, number>();
  const a = metrics.advances;
  for (let i = 0; i < a.length; i += 2) advances.set(a[i]!, a[i + 1]!);
  const kerning = new Map<number, number>();
  const k = metrics.kerning;
  for (let i = 0; i < k.length; i += 3) kerning.set(k[i]! * PAIR + k[i + 1]!, k[i + 2]!);
  return { metrics, advances, kerning };
}

/**
 * Lays out a single line of text from cached advances and kerning pairs: the glyphs with their
 * x offsets. No shaping beyond pair kerning: chart labels do not need it.
 */
export function layoutRun(face: CompiledFace, text: string): PlacedGlyph[] {
  const glyphs: PlacedGlyph[] = [];
  let x = 0;
  let previous = -1;
  for (const ch of text) {
    const cp = ch.codePointAt(0)!;
    const advance = face.advances.get(cp);
    if (previous >= 0) x += face.kerning.get(previous * PAIR + cp) ?? 0;
    if (advance === undefined) {
      glyphs.push({ codePoint: -1, x });
      x += face.metrics.notdefAdvance;
      previous = -1;
    } else {
      glyphs.push({ codePoint: cp, x });
      x += advance;
      previous = cp;
    }
  }
  return glyphs;
}

/** The advance of a line of text in font units, without building the glyph list. */
export function runAdvance(face: CompiledFace, text: string): number {
  let x = 0;
  let previous = -1;
  for (let i = 0; i < text.length; i++) {
    const cp = text.codePointAt(i)!;
    if (cp > 0xffff) i++;
    const advance = face.advances.get(cp);
    if (previous >= 0) x += face.kerning.get(previous * PAIR + cp) ?? 0;
    x += advance ?? face.metrics.notdefAdvance;
    previous = advance === undefined ? -1 : cp;
  }
  return x;
}

/** Characters of the text the face has no glyph for. */
export function missingCharacters(face: CompiledFace, text: string): string[] {
  // Printable ASCII is in every face chartwright ships (test/font checks the full cmap).
  if (/^[\x20-\x7e]*$/.test(text)) return [];
  const missing: string[] = [];
  for (const ch of text) if (!face.advances.has(ch.codePointAt(0)!)) missing.push(ch);
  return missing;
}
