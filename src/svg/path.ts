import type { PathCommand } from '../scene/types.js';
import { fmt } from './fmt.js';

/** Writes path commands as SVG path data, every number through `fmt`. */
export function pathData(commands: readonly PathCommand[]): string {
  let d = '';
  for (const c of commands) {
    switch (c.op) {
      case 'M': case 'L': d += `${c.op}${fmt(c.x)} ${fmt(c.y)}`; break;
      case 'C': d += `C${fmt(c.x1)} ${fmt(c.y1)} ${fmt(c.x2)} ${fmt(c.y2)} ${fmt(c.x)} ${fmt(c.y)}`; break;
      case 'A': d += `A${fmt(c.rx)} ${fmt(c.ry)} ${fmt(c.rotation)} ${c.large ? 1 : 0} ${c.sweep ? 1 : 0} ${fmt(c.x)} ${fmt(c.y)}`; break;
      case 'Z': d += 'Z'; break;
    }
  }
  return d;
}

/** A straight segment from (x1, y1) to (x2, y2). */
export function segment(x1: number, y1: number, x2: number, y2: number): PathCommand[] {
  return [{ op: 'M', x: x1, y: y1 }, { op: 'L', x: x2, y: y2 }];
}

/** A polyline through points, in order. */
export function polyline(points: readonly { x: number; y: number }[]): PathCommand[] {
  return points.map((p, i) => ({ op: i === 0 ? 'M' : 'L', x: p.x, y: p.y }));
}
