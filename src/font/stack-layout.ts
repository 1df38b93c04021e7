import type { Weight } from '../style/types.js';
import { embeddingLevels, mirroredReversed, visualOrder } from './bidi.js';
import { layoutRun, runAdvance, type CompiledFace, type PlacedGlyph } from './metrics.js';
import type { FaceRef, OutsideFace } from './outside-face.js';
import { hasRightToLeft, isNeutral, scriptOf, type ScriptName } from './scripts.js';

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
  /** Characters no face of the stack has. */
  missing: string[];
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

/** Picks a face for each code point: `faces` grows as sources open; -1 where none has the glyph. */
function assignFaces(cps: number[], primary: StackFace, sources: readonly FaceSource[], weight: Weight): { picks: number[]; faces: StackFace[] } {
  const faces: StackFace[] = [primary];
  const opened = new Map<FaceSource, number>();
  const faceOf = (s: FaceSource): number => {
    if (!opened.has(s)) {
      const f = s.face(weight);
      opened.set(s, f ? faces.push(f) - 1 : -1);
    }
    return opened.get(s)!;
  };
  const picks: number[] = [];
  for (const cp of cps) {
    const script = scriptOf(cp);
    const previous = picks.length ? picks[picks.length - 1]! : -1;
    // Spaces, digits, punctuation and marks stay in the face of the text around them, so a run is not split for them.
    if (isNeutral(script) && previous >= 0 && hasGlyph(faces[previous]!, cp)) { picks.push(previous); continue; }
    let pick = hasGlyph(primary, cp) ? 0 : -1;
    for (let i = 0; pick < 0 && i < sources.length; i++) {
      if (!sources[i]!.serves(script)) continue;
      const at = faceOf(sources[i]!);
      if (at >= 0 && hasGlyph(faces[at]!, cp)) pick = at;
    }
    picks.push(pick);
  }
  return { picks, faces };
}

/** One run shaped in its face: glyphs in visual order and its advance, in the face's units. */
function shapeRun(f: StackFace, text: string, rtl: boolean, scale: number): { glyphs: PlacedGlyph[]; advance: number } {
  if (f.kind === 'bundled') {
    // The bundled face has no right-to-left letters: a right-to-left run of it is neutrals (spaces, brackets), drawn reversed and mirrored.
    const drawn = rtl ? mirroredReversed(text) : text;
    return { glyphs: layoutRun(f.face, drawn).map((g) => ({ codePoint: g.codePoint, x: g.x * scale })), advance: runAdvance(f.face, drawn) * scale };
  }
  const shaped = f.face.shape(text, rtl);
  const glyphs = shaped.glyphs.map((g): PlacedGlyph => ({ codePoint: 0, x: g.x * scale, ...(g.y ? { y: g.y * scale } : {}), face: f.ref.key, glyph: g.id, d: scalePath(f.face.path(g.id), scale) }));
  return { glyphs, advance: shaped.advance * scale };
}

interface Run { face: number; level: number; text: string }

/** Splits the text into runs of one face and one embedding level, in logical order. */
function splitRuns(text: string, picks: readonly number[], levels: Uint8Array | undefined): Run[] {
  const runs: Run[] = [];
  let i = 0;
  let unit = 0;
  for (const ch of text) {
    const face = Math.max(0, picks[i]!);
    const level = levels ? levels[unit]! : 0;
    const last = runs[runs.length - 1];
    if (last && last.face === face && last.level === level) last.text += ch;
    else runs.push({ face, level, text: ch });
    i++;
    unit += ch.length;
  }
  return runs;
}

/**
 * A line over a stack of faces: each character from the first face that has it (per-character
 * fallback), runs ordered by the Unicode Bidirectional Algorithm when the line holds
 * right-to-left letters, each run shaped by its face.
 */
export function layoutStackLine(text: string, primary: StackFace, sources: readonly FaceSource[], weight: Weight): StackLine {
  const chars = [...text];
  const { picks, faces } = assignFaces(chars.map((c) => c.codePointAt(0)!), primary, sources, weight);
  const runs = splitRuns(text, picks, hasRightToLeft(text) ? embeddingLevels(text) : undefined);
  const glyphs: PlacedGlyph[] = [];
  let x = 0;
  for (const r of visualOrder(runs.map((run) => run.level))) {
    const run = runs[r]!;
    const face = faces[run.face]!;
    const shaped = shapeRun(face, run.text, run.level % 2 === 1, unitsPerEm(primary) / unitsPerEm(face));
    for (const g of shaped.glyphs) glyphs.push({ ...g, x: g.x + x });
    x += shaped.advance;
  }
  const segments: StackLine['segments'] = [];
  for (const run of runs) {
    const last = segments[segments.length - 1];
    if (last && last.face === faces[run.face]!.ref) last.text += run.text;
    else segments.push({ face: faces[run.face]!.ref, text: run.text });
  }
  return { glyphs, advance: x, segments, missing: chars.filter((_, i) => picks[i]! < 0) };
}
