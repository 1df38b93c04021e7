import type { PathCommand } from '../scene/types.js';

/** A point at a radius and an angle (degrees clockwise from 12 o'clock) around a centre, in screen coordinates (y down). */
export function polarPoint(cx: number, cy: number, radius: number, degrees: number): { x: number; y: number } {
  const a = (degrees * Math.PI) / 180;
  return { x: cx + radius * Math.sin(a), y: cy - radius * Math.cos(a) };
}

/**
 * An annular sector (a bar around a circle) from radius r0 to r1 and from angle a0 to a1
 * (degrees clockwise from 12 o'clock, a1 > a0, less than a full turn): outer arc clockwise,
 * inner arc back.
 */
export function sectorCommands(cx: number, cy: number, r0: number, r1: number, a0: number, a1: number): PathCommand[] {
  const large = a1 - a0 > 180;
  const [o0, o1, i1, i0] = [polarPoint(cx, cy, r1, a0), polarPoint(cx, cy, r1, a1), polarPoint(cx, cy, r0, a1), polarPoint(cx, cy, r0, a0)];
  return [
    { op: 'M', ...o0 },
    { op: 'A', rx: r1, ry: r1, rotation: 0, large, sweep: true, ...o1 },
    { op: 'L', ...i1 },
    { op: 'A', rx: r0, ry: r0, rotation: 0, large, sweep: false, ...i0 },
    { op: 'Z' },
  ];
}

/** A full circle as two half arcs (a ring gridline), starting at 12 o'clock. */
export function ringCommands(cx: number, cy: number, r: number): PathCommand[] {
  return [
    { op: 'M', x: cx, y: cy - r },
    { op: 'A', rx: r, ry: r, rotation: 0, large: false, sweep: true, x: cx, y: cy + r },
    { op: 'A', rx: r, ry: r, rotation: 0, large: false, sweep: true, x: cx, y: cy - r },
  ];
}
