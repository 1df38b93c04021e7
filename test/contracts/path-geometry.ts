import type { PathCommand } from '../../src/scene/types.js';

/** Points along a circular arc (rx = ry, no rotation: the wedges and sectors charts draw), by SVG's endpoint-to-centre conversion (SVG 1.1, F.6.5). */
export function arcPoints(from: [number, number], c: Extract<PathCommand, { op: 'A' }>): [number, number][] {
  const [x1, y1] = from;
  const hx = (x1 - c.x) / 2;
  const hy = (y1 - c.y) / 2;
  const r = Math.max(c.rx, Math.hypot(hx, hy));
  const k = (c.large !== c.sweep ? 1 : -1) * Math.sqrt(Math.max(0, (r * r - hx * hx - hy * hy) / (hx * hx + hy * hy || 1)));
  const [cx, cy] = [k * hy + (x1 + c.x) / 2, -k * hx + (y1 + c.y) / 2];
  const a0 = Math.atan2(y1 - cy, x1 - cx);
  let da = Math.atan2(c.y - cy, c.x - cx) - a0;
  if (c.sweep && da < 0) da += 2 * Math.PI;
  if (!c.sweep && da > 0) da -= 2 * Math.PI;
  return Array.from({ length: 24 }, (_, i) => [cx + r * Math.cos(a0 + (da * (i + 1)) / 24), cy + r * Math.sin(a0 + (da * (i + 1)) / 24)]);
}

/** A path's outline as polygons: line and curve ends, and circular arcs sampled along the circle. */
export function polygon(commands: readonly PathCommand[]): [number, number][][] {
  const rings: [number, number][][] = [];
  for (const c of commands) {
    if (c.op === 'Z') continue;
    if (c.op === 'M') rings.push([]);
    const ring = rings.at(-1);
    if (!ring) continue;
    if (c.op === 'A' && ring.length) ring.push(...arcPoints(ring.at(-1)!, c));
    else ring.push([c.x, c.y]);
  }
  return rings;
}
