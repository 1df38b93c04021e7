import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { pearson } from '../../src/derive/correlation.js';
import { dumpScene, type DumpMark, type SceneDump } from '../../src/scene/dump.js';
import { renderDemo, renderRows, root } from '../helpers.js';

// Anscombe's quartet (F. J. Anscombe, The American Statistician 27(1), 1973), as REFERENCES §10 gives it.
const X = [10, 8, 13, 9, 11, 14, 6, 4, 12, 7, 5];
const Y = [
  [8.04, 6.95, 7.58, 8.81, 8.33, 9.96, 7.24, 4.26, 10.84, 4.82, 5.68],
  [9.14, 8.14, 8.74, 8.77, 9.26, 8.10, 6.13, 3.10, 9.13, 7.26, 4.74],
  [7.46, 6.77, 12.74, 7.11, 7.81, 8.84, 6.08, 5.39, 8.15, 6.42, 5.73],
  [6.58, 5.76, 7.71, 8.84, 8.47, 7.04, 5.25, 12.50, 5.56, 7.91, 6.89],
];
const X4 = [8, 8, 8, 8, 8, 8, 8, 19, 8, 8, 8];
const anscombe = X.map((x, i) => ({ id: `o${i}`, x1: x, y1: Y[0]![i], x2: x, y2: Y[1]![i], x3: x, y3: Y[2]![i], x4: X4[i], y4: Y[3]![i] }));
const fields = Object.fromEntries(['x1', 'y1', 'x2', 'y2', 'x3', 'y3', 'x4', 'y4'].map((f) => [f, { unit: 'units' }]));

const pointsIn = (dump: SceneDump, x: string, y: string): DumpMark[] => dump.marks.filter((m) => m.role === 'point' && m.datum![x] !== undefined && m.datum![y] !== undefined && Object.keys(m.datum!).length === 3);

describe('scatterplot matrix contracts', () => {
  it('Anscombe\'s quartet: the four x–y panels have equal statistics but visibly different point patterns', async () => {
    const r = await renderRows({ intent: 'profile', keys: 'id', values: ['x1', 'y1', 'x2', 'y2', 'x3', 'y3', 'x4', 'y4'], fields }, anscombe);
    expect(r.choice!.form).toBe('scatter-matrix');
    const dump = dumpScene(r.scene!);
    const panels = [1, 2, 3, 4].map((k) => pointsIn(dump, `x${k}`, `y${k}`));
    for (const [k, pts] of panels.entries()) {
      expect(pts).toHaveLength(11);
      // Equal statistics: r = 0.816421, 0.816237, 0.816287, 0.816521 (REFERENCES §10; simple-statistics, jstat and R agree), read back from the drawn points' data.
      expect(pearson(pts.map((p) => p.datum![`x${k + 1}`] as number), pts.map((p) => p.datum![`y${k + 1}`] as number))).toBeCloseTo([0.816421, 0.816237, 0.816287, 0.816521][k]!, 6);
    }
    // Visibly different: panel IV stacks ten points on one x; the others spread over eleven.
    const columns = panels.map((pts) => new Set(pts.map((p) => Math.round(p.cx! * 10))).size);
    expect(columns).toEqual([11, 11, 11, 2]);
    // And no two of I–III draw the same pattern: relative heights differ by more than 5 px somewhere.
    const shape = (pts: DumpMark[]) => [...pts].sort((a, b) => a.cx! - b.cx!).map((p) => p.cy! - pts[0]!.cy!);
    for (const [a, b] of [[0, 1], [0, 2], [1, 2]] as const) {
      const diff = Math.max(...shape(panels[a]!).map((v, i) => Math.abs(v - shape(panels[b]!)[i]!)));
      expect(diff).toBeGreaterThan(5);
    }
  });

  it('harbour-water: p(p − 1)/2 pair panels of one size, each naming its pair of fields, and a named diagonal', async () => {
    const { dump } = await renderDemo(join(root, 'demo-data', 'harbour-water.yaml'));
    const cells = dump.marks.filter((m) => m.role === 'panel');
    const pairs = cells.filter((c) => c.datum!.x !== undefined);
    expect(pairs).toHaveLength(6);
    expect(cells).toHaveLength(10);
    const sizes = new Set(cells.map((c) => `${c.width}×${c.height}`));
    expect(sizes.size).toBe(1);
    expect(dump.texts.filter((t) => t.role === 'panel-title').map((t) => t.text)).toEqual(['Temperature (°C)', 'Salinity (PSU)', 'Oxygen (mg/l)', 'Turbidity (NTU)']);
    // Every point lies inside its panel.
    for (const p of dump.marks.filter((m) => m.role === 'point')) {
      const keys = Object.keys(p.datum!).filter((k) => k !== 'sample');
      const cell = pairs.find((c) => c.datum!.x === keys[0] && c.datum!.y === keys[1])!;
      expect(p.cx!).toBeGreaterThanOrEqual(cell.x!);
      expect(p.cx!).toBeLessThanOrEqual(cell.x! + cell.width!);
      expect(p.cy!).toBeGreaterThanOrEqual(cell.y!);
      expect(p.cy!).toBeLessThanOrEqual(cell.y! + cell.height!);
    }
    expect(dump.legends[0]).toMatchObject({ kind: 'categorical', field: 'pier' });
  });

  it('translucency grows with the item count', async () => {
    const rows = (n: number) => Array.from({ length: n }, (_, i) => ({ a: i % 7, b: (i * 3) % 11, c: (i * 5) % 13 }));
    const opacity = async (n: number) => dumpScene((await renderRows({ intent: 'profile', values: ['a', 'b', 'c'], fields: { a: { unit: 'u' }, b: { unit: 'u' }, c: { unit: 'u' } } }, rows(n))).scene!).marks.find((m) => m.role === 'point')!.opacity ?? 1;
    const [few, many] = [await opacity(10), await opacity(400)];
    expect(few).toBe(1);
    expect(many).toBeLessThan(few);
  });
});
