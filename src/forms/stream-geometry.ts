import { hermiteAt, monotoneTangents } from '../derive/monotone.js';
import type { PathCommand } from '../scene/types.js';

/** A boundary between layers in px: its y and its slope (dy/dx) at each key. */
export interface Boundary {
  ys: number[];
  ts: number[];
}

/**
 * The n + 1 boundaries of n stacked layers, bottom first: the baseline, then each layer's top. The
 * baseline and every thickness get their own monotone tangents and a boundary's tangent is their
 * sum, so the curve between two boundaries is exactly the monotone curve of that layer's
 * thickness: never below zero, and shared by the layers on either side (no gap, no overlap).
 * Thicknesses are in px, negative upwards (screen y grows down).
 */
export function streamBoundaries(xs: readonly number[], baseline: readonly number[], thickness: readonly (readonly number[])[]): Boundary[] {
  const bottom: Boundary = { ys: [...baseline], ts: monotoneTangents(xs, baseline) };
  const out = [bottom];
  for (const layer of thickness) {
    const below = out[out.length - 1]!;
    const t = monotoneTangents(xs, layer);
    out.push({ ys: below.ys.map((y, k) => y + layer[k]!), ts: below.ts.map((s, k) => s + t[k]!) });
  }
  return out;
}

/** The y of a boundary at x (within the keys' span). */
export function boundaryAt(xs: readonly number[], b: Boundary, x: number): number {
  let k = 0;
  while (k < xs.length - 2 && x > xs[k + 1]!) k++;
  return hermiteAt(xs[k]!, xs[k + 1]!, b.ys[k]!, b.ys[k + 1]!, b.ts[k]!, b.ts[k + 1]!, x);
}

/** The cubic Bézier segments of a boundary from key `from` to key `to` (either direction). */
function segments(xs: readonly number[], b: Boundary, forward: boolean): PathCommand[] {
  const out: PathCommand[] = [];
  const n = xs.length;
  for (let j = 1; j < n; j++) {
    const [a, c] = forward ? [j - 1, j] : [n - j, n - j - 1];
    const third = (xs[c]! - xs[a]!) / 3;
    out.push({ op: 'C', x1: xs[a]! + third, y1: b.ys[a]! + third * b.ts[a]!, x2: xs[c]! - third, y2: b.ys[c]! - third * b.ts[c]!, x: xs[c]!, y: b.ys[c]! });
  }
  return out;
}

/** A layer's outline: along its top boundary left to right, then back along its bottom boundary. */
export function layerCommands(xs: readonly number[], lower: Boundary, upper: Boundary): PathCommand[] {
  const last = xs.length - 1;
  return [
    { op: 'M', x: xs[0]!, y: upper.ys[0]! },
    ...segments(xs, upper, true),
    { op: 'L', x: xs[last]!, y: lower.ys[last]! },
    ...segments(xs, lower, false),
    { op: 'Z' },
  ];
}
