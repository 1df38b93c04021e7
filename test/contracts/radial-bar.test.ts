import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { DumpMark, SceneDump } from '../../src/scene/dump.js';
import { renderDemo, root } from '../helpers.js';

const demo = join(root, 'demo-data', 'harbour-wind.yaml');
const COMPASS = ['N', 'NNE', 'NE', 'ENE', 'E', 'ESE', 'SE', 'SSE', 'S', 'SSW', 'SW', 'WSW', 'W', 'WNW', 'NW', 'NNW'];

const bars = (dump: SceneDump): DumpMark[] => dump.marks.filter((m) => m.role === 'bar');

/** The inner ring's radius: the distance of the zero ring's start (12 o'clock) from the circle's centre. */
function innerRing(dump: SceneDump): { cx: number; cy: number; r: number } {
  const ring = dump.marks.find((m) => m.role === 'axis-line')!;
  const [x, y, , r] = ring.d!.match(/-?\d+(\.\d+)?/g)!.map(Number) as [number, number, number, number];
  return { cx: x, cy: y + r, r };
}

describe('radial bar contracts (harbour-wind demo)', () => {
  it('radial bars keep cyclic order: one bar per compass point, clockwise, equal steps, the last one step before the first', async () => {
    const { dump } = await renderDemo(demo);
    expect(bars(dump).map((b) => b.datum!.direction)).toEqual(COMPASS);
    const angles = bars(dump).map((b) => b.angle!);
    const step = 360 / COMPASS.length;
    angles.forEach((a, i) => expect(a).toBeCloseTo(i * step, 6));
    expect(360 - angles.at(-1)! + angles[0]!).toBeCloseTo(step, 6);
  });

  it('bar length from the inner ring is proportional to value: one px per unit for every bar, within 0.5 px', async () => {
    const { dump } = await renderDemo(demo);
    const { r } = innerRing(dump);
    const perUnit = bars(dump).map((b) => (b.radius! - r) / (b.datum!.hours as number));
    const ref = perUnit[0]!;
    for (const b of bars(dump)) expect(Math.abs(b.radius! - r - (b.datum!.hours as number) * ref)).toBeLessThanOrEqual(0.5);
    expect(ref).toBeGreaterThan(0);
  });

  it('every bar starts at the inner ring: its path begins on the outer arc and returns along the inner one', async () => {
    const { dump } = await renderDemo(demo);
    const { cx, cy, r } = innerRing(dump);
    for (const b of bars(dump)) {
      const nums = b.d!.match(/-?\d+(\.\d+)?/g)!.map(Number);
      // M x y A rx ry rot large sweep x y L x y A r r …: the L point lies on the inner ring.
      const [lx, ly] = [nums[9]!, nums[10]!];
      expect(Math.abs(Math.hypot(lx - cx, ly - cy) - r)).toBeLessThan(0.01);
      expect(nums[11]).toBeCloseTo(r, 2);
    }
  });

  it('no text leaves the canvas and no two texts overlap', async () => {
    const { dump, result } = await renderDemo(demo);
    expect(result.diagnostics.filter((d) => d.code.startsWith('layout.'))).toEqual([]);
    for (const t of dump.texts) {
      expect(t.x).toBeGreaterThanOrEqual(0);
      expect(t.x + t.width).toBeLessThanOrEqual(dump.width);
    }
  });
});
