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

/**
 * One glyph placed in a run: its code point (or -1 for .notdef) and x offset in font units. A
 * glyph from a face other than the bundled one also names that face (`face`, a FaceRef key),
 * its glyph id there, its y offset (marks, Arabic joining) and its outline in the run's units.
 */
export interface PlacedGlyph {
  codePoint: number;
  x: number;
  face?: string;
  glyph?: number;
  y?: number;
  d?: string;
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

/** Kerning in font units between `previous` (a code point with a glyph, or -1 for none) and `cp`. */
function kernAfter(face: CompiledFace, previous: number, cp: number): number {
  return previous >= 0 ? face.kerning.get(previous * PAIR + cp) ?? 0 : 0;
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
    x += kernAfter(face, previous, cp);
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

/**
 * The advance of a line of text in font units, without building the glyph list. `previous`
 * continues a run: the code point set just before the text (-1, the default, starts a new one).
 */
export function runAdvance(face: CompiledFace, text: string, previous = -1): number {
  let x = 0;
  for (let i = 0; i < text.length; i++) {
    const cp = text.codePointAt(i)!;
    if (cp > 0xffff) i++;
    const advance = face.advances.get(cp);
    x += kernAfter(face, previous, cp);
    x += advance ?? face.metrics.notdefAdvance;
    previous = advance === undefined ? -1 : cp;
  }
  return x;
}

/**
 * A text laid out once, per code point, in font units: `x[i]` is where code point i is set
 * (after its kerning), `pen[i]` the advance of the first i code points, `offsets[i]` the UTF-16
 * index of code point i. The code points [a, b) set on their own advance `pen[b] - x[a]`,
 * exactly `runAdvance` of that slice: advances and kerning are whole font units, so the sums
 * are exact in doubles (test/font checks the metrics hold only integers).
 */
export interface RunPositions {
  length: number;
  x: Float64Array;
  pen: Float64Array;
  offsets: Uint32Array;
}

/** Positions of every code point of a line of text, by the same steps as `runAdvance`. */
export function runPositions(face: CompiledFace, text: string): RunPositions {
  const x = new Float64Array(text.length + 1);
  const pen = new Float64Array(text.length + 1);
  const offsets = new Uint32Array(text.length + 1);
  let n = 0;
  let previous = -1;
  for (let i = 0; i < text.length; i++, n++) {
    offsets[n] = i;
    const cp = text.codePointAt(i)!;
    if (cp > 0xffff) i++;
    const advance = face.advances.get(cp);
    x[n] = pen[n]! + kernAfter(face, previous, cp);
    pen[n + 1] = x[n]! + (advance ?? face.metrics.notdefAdvance);
    previous = advance === undefined ? -1 : cp;
  }
  offsets[n] = text.length;
  x[n] = pen[n]!;
  return { length: n, x: x.subarray(0, n + 1), pen: pen.subarray(0, n + 1), offsets: offsets.subarray(0, n + 1) };
}

/** The code point a run continues from after the code point `cp`: itself if the face has its glyph, else -1. */
export function runPrevious(face: CompiledFace, cp: number): number {
  return face.advances.has(cp) ? cp : -1;
}

/** Characters of the text the face has no glyph for. */
export function missingCharacters(face: CompiledFace, text: string): string[] {
  // Printable ASCII is in every face chartwright ships (test/font checks the full cmap).
  if (/^[\x20-\x7e]*$/.test(text)) return [];
  const missing: string[] = [];
  for (const ch of text) if (!face.advances.has(ch.codePointAt(0)!)) missing.push(ch);
  return missing;
}
