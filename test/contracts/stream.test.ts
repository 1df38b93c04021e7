import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { PathCommand, PathNode, Scene } from '../../src/scene/types.js';
import { nodesOf } from '../../src/scene/walk.js';
import { renderDemo, renderRows, root } from '../helpers.js';

const demo = join(root, 'demo-data', 'fish-landings.yaml');

const layers = (scene: Scene): PathNode[] => nodesOf(scene.root).filter((n): n is PathNode => n.kind === 'path' && n.role === 'layer');

/** A layer outline's two edges: its top (left to right) and its bottom (right to left), as the commands draw them. */
function edges(node: PathNode): { top: PathCommand[]; bottom: PathCommand[] } {
  const l = node.commands.findIndex((c) => c.op === 'L');
  return { top: node.commands.slice(0, l), bottom: node.commands.slice(l, -1) };
}

/** An edge as the points it passes through and its control points, left to right. */
function forward(edge: PathCommand[], reversed: boolean): number[][] {
  const pts: number[][] = [];
  if (!reversed) {
    for (const c of edge) if (c.op === 'M') pts.push([c.x, c.y]); else if (c.op === 'C') pts.push([c.x1, c.y1], [c.x2, c.y2], [c.x, c.y]);
    return pts;
  }
  // Drawn right to left: M/L start, then C with (x1, y1) near the start of each segment.
  const [start, ...curves] = edge as [{ x: number; y: number }, ...Extract<PathCommand, { op: 'C' }>[]];
  pts.push([start.x, start.y]);
  for (const c of curves) pts.push([c.x1, c.y1], [c.x2, c.y2], [c.x, c.y]);
  return pts.reverse();
}

function checkStackContracts(scene: Scene, valueName: string) {
  const ls = layers(scene);
  expect(ls.length).toBeGreaterThan(1);
  // No gap, no overlap: each layer's top edge is exactly the next layer's bottom edge, control points included.
  for (let i = 0; i + 1 < ls.length; i++) {
    expect(forward(edges(ls[i + 1]!).bottom, true)).toEqual(forward(edges(ls[i]!).top, false));
  }
  // Thickness at each key is the value at one px-per-unit scale, so the layers sum to the total at every key.
  const keys = ls[0]!.points!.length;
  const bottoms = ls.map((l) => forward(edges(l).bottom, true).filter((_, j) => j % 3 === 0).map((p) => p[1]!));
  let perUnit: number | undefined;
  for (let k = 0; k < keys; k++) {
    let total = 0;
    ls.forEach((l, i) => {
      const value = l.points![k]!.datum![valueName] as number;
      const thickness = bottoms[i]![k]! - l.points![k]!.y;
      expect(thickness).toBeGreaterThanOrEqual(-1e-9);
      if (value > 0) perUnit ??= thickness / value;
      if (perUnit !== undefined) expect(Math.abs(thickness - value * perUnit)).toBeLessThan(1e-6);
      total += value;
    });
    const span = bottoms[0]![k]! - ls.at(-1)!.points![k]!.y;
    if (perUnit !== undefined) expect(Math.abs(span - total * perUnit)).toBeLessThan(1e-6);
  }
}

describe('streamgraph contracts', () => {
  it('fish-landings: layers never overlap or leave gaps, and sum to the total at every key', async () => {
    const { result } = await renderDemo(demo);
    checkStackContracts(result.scene!, 'tonnes');
    expect(result.diagnostics.filter((d) => d.code.startsWith('layout.'))).toEqual([]);
  });

  it('with series that start late and stop early, layers still share their edges and keep the totals', async () => {
    const rows = Array.from({ length: 12 }, (_, k) => ['a', 'b', 'c', 'd', 'e'].map((s, i) => ({ t: 2000 + k, s, v: k >= i * 2 && k < 12 - i ? ((k * 7 + i * 3) % 11) + 1 : 0 }))).flat();
    const r = await renderRows({ intent: 'flow', keys: ['t', 's'], values: 'v', fields: { v: { unit: 'boats' } } }, rows);
    expect(r.ok).toBe(true);
    checkStackContracts(r.scene!, 'v');
  });

  it('between keys no layer goes below zero thickness: its top edge stays above its bottom edge along the whole curve', async () => {
    const rows = [0, 50, 0, 0, 80, 1, 0].flatMap((v, t) => [{ t: t + 1, s: 'spiky', v }, { t: t + 1, s: 'calm', v: 10 }]);
    const r = await renderRows({ intent: 'flow', keys: ['t', 's'], values: 'v', fields: { v: { unit: 'boats' } } }, rows);
    for (const l of layers(r.scene!)) {
      const top = forward(edges(l).top, false);
      const bottom = forward(edges(l).bottom, true);
      // A cubic Bézier lies between its control points' hull; sample it on both edges.
      for (let seg = 0; seg + 3 < top.length; seg += 3) {
        for (let s = 0; s <= 16; s++) {
          const u = s / 16;
          const bez = (p: number[][]) => (1 - u) ** 3 * p[seg]![1]! + 3 * (1 - u) ** 2 * u * p[seg + 1]![1]! + 3 * (1 - u) * u * u * p[seg + 2]![1]! + u ** 3 * p[seg + 3]![1]!;
          expect(bez(bottom) - bez(top)).toBeGreaterThanOrEqual(-1e-9);
        }
      }
    }
  });
});
