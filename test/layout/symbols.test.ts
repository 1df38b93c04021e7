import { describe, expect, it } from 'vitest';
import { SHAPES, symbolCommands, symbolNode } from '../../src/layout/symbols.js';
import type { PathCommand } from '../../src/scene/types.js';

/** Area of the closed polygons of a path (shoelace formula), summed over its subpaths. */
function polygonArea(commands: readonly PathCommand[]): number {
  let area = 0;
  let ring: { x: number; y: number }[] = [];
  const close = () => {
    for (let i = 0; i < ring.length; i++) {
      const a = ring[i]!, b = ring[(i + 1) % ring.length]!;
      area += (a.x * b.y - b.x * a.y) / 2;
    }
    ring = [];
  };
  for (const c of commands) {
    if (c.op === 'M') { close(); ring.push(c); } else if (c.op === 'L') ring.push(c); else if (c.op === 'Z') close();
  }
  close();
  return Math.abs(area);
}

describe('point symbols', () => {
  // External check: d3-shape's symbol generator takes "the area of the symbol in square
  // pixels" as its size (d3-shape 3.2 README, symbol.size), so every shape covers the area asked.
  it('draws every polygon shape with the area asked for, centred on its point', () => {
    for (const shape of SHAPES) {
      if (shape === 'circle') continue;
      const commands = symbolCommands(shape, 50, 40, 64);
      expect(polygonArea(commands), shape).toBeCloseTo(64, 6);
      const pts = commands.flatMap((c) => ('x' in c ? [c] : []));
      expect(Math.min(...pts.map((p) => p.x)) < 50 && Math.max(...pts.map((p) => p.x)) > 50, shape).toBe(true);
      expect(Math.min(...pts.map((p) => p.y)) < 40 && Math.max(...pts.map((p) => p.y)) > 40, shape).toBe(true);
    }
  });

  it('draws the circle as a circle node of the same area, with its paint and datum', () => {
    const n = symbolNode('circle', { id: 'p1', role: 'point', cx: 3, cy: 4, area: 100, paint: { fill: '#102030', stroke: '#ffffff', strokeWidth: 1 }, datum: { pier: 'North' } });
    expect(n).toMatchObject({ kind: 'circle', cx: 3, cy: 4, fill: '#102030', stroke: '#ffffff', datum: { pier: 'North' } });
    expect(n.kind === 'circle' && Math.PI * n.r ** 2).toBeCloseTo(100, 9);
    expect(symbolNode('star', { id: 'p2', role: 'point', cx: 0, cy: 0, area: 10, paint: { fill: '#000000' } }).kind).toBe('path');
  });
});
