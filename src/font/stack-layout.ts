import type { Weight } from '../style/types.js';
import { embeddingLevels, mirroredReversed, visualOrder } from './bidi.js';
import { layoutRun, runAdvance, type CompiledFace, type PlacedGlyph } from './metrics.js';
import type { FaceRef, OutsideFace } from './outside-face.js';
import { hasRightToLeft, scriptOf, type ScriptName } from './scripts.js';

/** A face of a stack, bundled (metrics by code point) or read from a file (shaped by glyph id). */
export type StackFace = { kind: 'bundled'; ref: FaceRef; face: CompiledFace } | { kind: 'outside'; ref: FaceRef; face: OutsideFace };

/** Where a stack looks for faces after its first: opened lazily, by weight. */
export interface FaceSource {
  /** Whether this source is tried for a letter of the script (a style's own fallbacks serve every script). */
  serves(script: ScriptName): boolean;
  /** The face for a weight, opened on first use; undefined when it cannot be had (package not installed). */
  face(weight: Weight): StackFace | undefined;
}

/** A line laid out over a stack of faces: glyphs in visual order, in the first face's units. */
export interface StackLine {
  glyphs: PlacedGlyph[];
  advance: number;
  /** Runs of the text in logical order, each with the face that draws it. */
  segments: Array<{ face: FaceRef; text: string }>;
}

function hasGlyph(f: StackFace, cp: number): boolean {
  return f.kind === 'bundled' ? f.face.advances.has(cp) : f.face.has(cp);
}

/** A face's units per em. */
export function unitsPerEm(f: StackFace): number {
  return f.kind === 'bundled' ? f.face.metrics.unitsPerEm : f.face.unitsPerEm;
}

/** Scales SVG path data whose numbers are all absolute coordinates (fontkit writes M, L, Q, C, Z). */
function scalePath(d: string, s: number): string {
  return s === 1 ? d : d.replace(/-?\d*\.?\d+(?:e[-+]?\d+)?/gi, (n) => String(Number((Number(n) * s).toFixed(3))));
}

/** Outlines scaled to a stack's units, per face and glyph (a face is in stacks of one unit size or few). */
const scaledPaths = new WeakMap<OutsideFace, Map<string, string>>();

function scaledPath(face: OutsideFace, id: number, scale: number): string {
  let paths = scaledPaths.get(face);
  if (!paths) scaledPaths.set(face, (paths = new Map()));
  const key = `${scale} ${id}`;
  let d = paths.get(key);
  if (d === undefined) paths.set(key, (d = scalePath(face.path(id), scale)));
  return d;
}

/** Picks a face for each code point of the text: `faces` grows as sources open; -1 where none has the glyph. */
function assignFaces(text: string, primary: StackFace, sources: readonly FaceSource[], weight: Weight): { picks: Int32Array; faces: StackFace[] } {
  const faces: StackFace[] = [primary];
  const opened = new Map<FaceSource, number>();
  const faceOf = (s: FaceSource): number => {
    if (!opened.has(s)) {
      const f = s.face(weight);
      opened.set(s, f ? faces.push(f) - 1 : -1);
    }
    return opened.get(s)!;
  };
  const picks = new Int32Array(text.length);
  let n = 0;
  for (let i = 0; i < text.length; i++, n++) {
    const cp = text.codePointAt(i)!;
    if (cp > 0xffff) i++;
    const previous = n > 0 ? picks[n - 1]! : -1;
    // Combining marks and joiners stay with the letter they follow; everything else, spaces and
    // digits included, takes the first face that has it, as CSS font fallback does per character.
    if (previous > 0 && scriptOf(cp) === 'Inherited' && hasGlyph(faces[previous]!, cp)) { picks[n] = previous; continue; }
    if (hasGlyph(primary, cp)) { picks[n] = 0; continue; }
    const script = scriptOf(cp);
    let pick = -1;
    for (let k = 0; pick < 0 && k < sources.length; k++) {
      if (!sources[k]!.serves(script)) continue;
      const at = faceOf(sources[k]!);
      if (at >= 0 && hasGlyph(faces[at]!, cp)) pick = at;
    }
    picks[n] = pick;
  }
  return { picks: picks.subarray(0, n), faces };
}

/** Characters of the text no face of the stack has. */
export function stackMissing(text: string, primary: StackFace, sources: readonly FaceSource[], weight: Weight): string[] {
  const { picks } = assignFaces(text, primary, sources, weight);
  const missing: string[] = [];
  let n = 0;
  for (const ch of text) if (picks[n++]! < 0) missing.push(ch);
  return missing;
}

/** One run shaped in its face: glyphs in visual order and its advance, in the face's units. */
function shapeRun(f: StackFace, text: string, rtl: boolean, scale: number): { glyphs: PlacedGlyph[]; advance: number } {
  if (f.kind === 'bundled') {
    // The bundled face has no right-to-left letters: a right-to-left run of it is neutrals (spaces, brackets), drawn reversed and mirrored.
    const drawn = rtl ? mirroredReversed(text) : text;
    return { glyphs: layoutRun(f.face, drawn).map((g) => ({ codePoint: g.codePoint, x: g.x * scale })), advance: runAdvance(f.face, drawn) * scale };
  }
  const shaped = f.face.shape(text, rtl);
  const glyphs = shaped.glyphs.map((g): PlacedGlyph => ({ codePoint: 0, x: g.x * scale, ...(g.y ? { y: g.y * scale } : {}), face: f.ref.key, glyph: g.id, d: scaledPath(f.face, g.id, scale) }));
  return { glyphs, advance: shaped.advance * scale };
}

/** A run's advance in its face's units, without placing its glyphs. */
function runAdvanceIn(f: StackFace, text: string, rtl: boolean): number {
  return f.kind === 'bundled' ? runAdvance(f.face, rtl ? mirroredReversed(text) : text) : f.face.shape(text, rtl).advance;
}

interface Run { face: number; level: number; text: string }

/** Splits the text into runs of one face and one embedding level, in logical order. */
function splitRuns(text: string, picks: Int32Array, levels: Uint8Array | undefined): Run[] {
  const runs: Run[] = [];
  let start = 0;
  let face = -1;
  let level = -1;
  let n = 0;
  for (let i = 0; i < text.length; i++, n++) {
    const f = Math.max(0, picks[n]!);
    const l = levels ? levels[i]! : 0;
    if (f !== face || l !== level) {
      if (i > start) runs.push({ face, level, text: text.slice(start, i) });
      start = i;
      face = f;
      level = l;
    }
    if (text.codePointAt(i)! > 0xffff) i++;
  }
  if (text.length > start) runs.push({ face, level, text: text.slice(start) });
  return runs;
}

/**
 * A line over a stack of faces: each character from the first face that has it (per-character
 * fallback), runs ordered by the Unicode Bidirectional Algorithm when the line holds
 * right-to-left letters, each run shaped by its face.
 */
export function layoutStackLine(text: string, primary: StackFace, sources: readonly FaceSource[], weight: Weight, advanceOnly = false): StackLine {
  const { picks, faces } = assignFaces(text, primary, sources, weight);
  const runs = splitRuns(text, picks, hasRightToLeft(text) ? embeddingLevels(text) : undefined);
  const glyphs: PlacedGlyph[] = [];
  let x = 0;
  for (const r of visualOrder(runs.map((run) => run.level))) {
    const run = runs[r]!;
    const face = faces[run.face]!;
    const scale = unitsPerEm(primary) / unitsPerEm(face);
    // The width of a long text needs only the runs' advances, not a glyph list with outlines.
    if (advanceOnly) { x += runAdvanceIn(face, run.text, run.level % 2 === 1) * scale; continue; }
    const shaped = shapeRun(face, run.text, run.level % 2 === 1, scale);
    for (const g of shaped.glyphs) glyphs.push({ ...g, x: g.x + x });
    x += shaped.advance;
  }
  const segments: StackLine['segments'] = [];
  for (const run of runs) {
    const last = segments[segments.length - 1];
    if (last && last.face === faces[run.face]!.ref) last.text += run.text;
    else segments.push({ face: faces[run.face]!.ref, text: run.text });
  }
  return { glyphs, advance: x, segments };
}
