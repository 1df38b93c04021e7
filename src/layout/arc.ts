import type { PathCommand } from '../scene/types.js';

/** A point at `angle` radians clockwise from 12 o'clock, `radius` px from (cx, cy). */
export function polar(cx: number, cy: number, radius: number, angle: number): { x: number; y: number } {
  return { x: cx + radius * Math.sin(angle), y: cy - radius * Math.cos(angle) };
}

/** One wedge of a ring: from `start` to `end` radians clockwise from 12 o'clock, between the inner and outer radius. */
export interface RingWedge {
  cx: number;
  cy: number;
  inner: number;
  outer: number;
  start: number;
  end: number;
}

/**
 * The outline of a ring wedge as path commands: along the outer circle clockwise, in to the
 * inner circle, back along it counter-clockwise. A wedge of (nearly) the whole turn is drawn as
 * two halves, since an SVG arc whose ends meet draws nothing.
 */
export function wedgePath(w: RingWedge): PathCommand[] {
  const sweep = w.end - w.start;
  if (sweep >= 2 * Math.PI - 1e-9) {
    const mid = w.start + Math.PI;
    return [...wedgePath({ ...w, end: mid }), ...wedgePath({ ...w, start: mid, end: w.start + 2 * Math.PI })];
  }
  const large = sweep > Math.PI;
  const [o0, o1] = [polar(w.cx, w.cy, w.outer, w.start), polar(w.cx, w.cy, w.outer, w.end)];
  const [i1, i0] = [polar(w.cx, w.cy, w.inner, w.end), polar(w.cx, w.cy, w.inner, w.start)];
  return [
    { op: 'M', ...o0 },
    { op: 'A', rx: w.outer, ry: w.outer, rotation: 0, large, sweep: true, ...o1 },
    { op: 'L', ...i1 },
    { op: 'A', rx: w.inner, ry: w.inner, rotation: 0, large, sweep: false, ...i0 },
    { op: 'Z' },
  ];
}

/** Angles of consecutive shares around the circle from 12 o'clock: each wedge starts where the one before ends, the last ends at exactly a full turn. */
export function shareAngles(shares: readonly number[]): { start: number; end: number }[] {
  const total = shares.reduce((a, b) => a + b, 0);
  let acc = 0;
  return shares.map((s, i) => {
    const start = (acc / total) * 2 * Math.PI;
    acc += s;
    return { start, end: i === shares.length - 1 ? 2 * Math.PI : (acc / total) * 2 * Math.PI };
  });
}
