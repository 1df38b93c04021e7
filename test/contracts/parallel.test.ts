import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { AxisInfo } from '../../src/scene/types.js';
import { dumpScene, type DumpMark, type SceneDump } from '../../src/scene/dump.js';
import { renderDemo, renderRows, root } from '../helpers.js';

const demo = join(root, 'demo-data', 'harbour-fleet.yaml');
const lines = (dump: SceneDump): DumpMark[] => dump.marks.filter((m) => m.role === 'line');

/** Value → px along a vertical axis, read from the dump's axis entry (a reversed axis lists its domain high to low). */
function pxOf(axis: AxisInfo): (v: number) => number {
  const [d0, d1] = axis.domain as [number, number];
  const [r0, r1] = axis.range;
  return (v) => r0 + ((v - d0) * (r1 - r0)) / (d1 - d0);
}

/** Where two lines through (a0, a1) and (b0, b1) meet. */
function meet(a0: { x: number; y: number }, a1: { x: number; y: number }, b0: { x: number; y: number }, b1: { x: number; y: number }) {
  const [ax, ay, bx, by] = [a1.x - a0.x, a1.y - a0.y, b1.x - b0.x, b1.y - b0.y];
  const t = ((b0.x - a0.x) * by - (b0.y - a0.y) * bx) / (ax * by - ay * bx);
  return { x: a0.x + t * ax, y: a0.y + t * ay };
}

describe('parallel coordinates contracts', () => {
  it('harbour-fleet: one line per boat with a point on every axis, at the axis\'s x and at its value on that axis\'s scale', async () => {
    const { dump } = await renderDemo(demo);
    expect(lines(dump)).toHaveLength(40);
    expect(dump.axes).toHaveLength(13);
    for (const a of dump.axes) {
      expect(a.title.trim()).not.toBe('');
      expect(a.position).toBeTypeOf('number');
      expect(a.ticks.length).toBeGreaterThan(1);
    }
    for (const line of lines(dump)) {
      line.points!.forEach((p, k) => {
        const axis = dump.axes[k]!;
        expect(p.x).toBeCloseTo(axis.position!, 3);
        expect(Math.abs(p.y - pxOf(axis)(p.datum![axis.field] as number))).toBeLessThan(0.01);
      });
    }
  });

  it('a reversed axis lists its domain high to low, and its neighbours then correlate positively as drawn', async () => {
    const { dump, result } = await renderDemo(demo);
    const flipped = dump.axes.filter((a) => (a.domain[0] as number) > (a.domain[1] as number));
    expect(flipped.length).toBeGreaterThan(0);
    expect(dump.texts.filter((t) => t.text === 'reversed')).toHaveLength(flipped.length);
    const pairs = result.rationale.filter((d) => d.data?.r !== undefined);
    expect(pairs).toHaveLength(12);
  });

  // REFERENCES §7 (Inselberg 1985; Wegman 1990): with axes X1 at u = 0 and X2 at u = d on one
  // scale, the points of the line y = m·x + b (m ≠ 1) map to segments through (d/(1 − m), b/(1 − m)).
  for (const [m, b] of [[0.5, 1], [3, -2], [-1, 4]] as const) {
    it(`line–point duality: points on y = ${m}·x + ${b} give lines meeting at (d/(1 − m), b/(1 − m))`, async () => {
      const rows = [1, 2, 3, 4, 5, 6].map((x) => ({ id: `p${x}`, x, y: m * x + b }));
      const r = await renderRows({ intent: 'profile', form: 'parallel', keys: 'id', values: ['x', 'y'], fields: { x: { unit: 'm' }, y: { unit: 'm' } } }, rows);
      expect(r.ok).toBe(true);
      const dump = dumpScene(r.scene!);
      // One shared scale (same unit); a negative slope would flip the second axis, which the duality assumes away: pin it.
      expect(r.rationale.some((d) => d.decision === 'one shared scale on every axis')).toBe(true);
      const [ax, ay] = dump.axes as [AxisInfo, AxisInfo];
      const ls = lines(dump);
      if (m < 0) {
        expect(ay.domain[0]).toBeGreaterThan(ay.domain[1] as number);
        return;
      }
      const d = ay.position! - ax.position!;
      const expected = { x: ax.position! + d / (1 - m), y: pxOf(ax)(b / (1 - m)) };
      for (let i = 1; i < ls.length; i++) {
        const p = meet(ls[0]!.points![0]!, ls[0]!.points![1]!, ls[i]!.points![0]!, ls[i]!.points![1]!);
        // The dump rounds to 1/1000 px; extrapolating the segments beyond the axes magnifies that a little.
        expect(p.x).toBeCloseTo(expected.x, 1);
        expect(p.y).toBeCloseTo(expected.y, 1);
      }
    });
  }

  it('fourteen long attribute names stand in staggered rows without overlapping, shortened only where three rows are not enough (regression: two rows overlapped)', async () => {
    const names = ['Dissolved oxygen (mg/L)', 'Water temperature at surface', 'Nitrate concentration', 'Phosphate concentration', 'Turbidity (nephelometric)', 'Conductivity at 25 degrees', 'Chlorophyll a fluorescence', 'Total suspended solids', 'Biochemical oxygen demand', 'Ammonium nitrogen', 'Secchi disc depth', 'Faecal coliform count', 'Silicate concentration', 'Dissolved organic carbon'];
    const rows = Array.from({ length: 30 }, (_, i) => Object.fromEntries([['station', `S${i}`], ...names.map((n, j) => [n, ((i * 7 + j * 13) % 23) + j])]));
    const r = await renderRows({ intent: 'profile', keys: 'station', values: names, form: 'parallel' }, rows);
    expect(r.ok).toBe(true);
    expect(r.diagnostics.map((d) => d.code)).not.toContain('layout.text-overlap');
    const titles = dumpScene(r.scene!).texts.filter((t) => t.role === 'axis-title');
    expect(titles).toHaveLength(14);
    for (let i = 0; i < titles.length; i++) {
      for (let j = i + 1; j < titles.length; j++) {
        const [a, b] = [titles[i]!, titles[j]!];
        const apart = a.x + a.width <= b.x + 1e-6 || b.x + b.width <= a.x + 1e-6 || a.y + a.height <= b.y + 1e-6 || b.y + b.height <= a.y + 1e-6;
        expect(apart, `${a.text} / ${b.text}`).toBe(true);
      }
    }
    expect(new Set(titles.map((t) => t.y)).size).toBe(3);
    expect(titles.filter((t) => names.includes(t.text)).length).toBeGreaterThanOrEqual(7);
  });
});
