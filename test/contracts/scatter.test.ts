import { describe, expect, it } from 'vitest';
import type { DotPlan } from '../../src/forms/dot-plan.js';
import type { ScatterPlan } from '../../src/forms/scatter-plan.js';
import { dumpScene } from '../../src/scene/dump.js';
import { demoBriefs, renderDemo, renderRows } from '../helpers.js';
import { axisPx, checkScatterContracts, checkTexts, points } from './point-contracts.js';

describe('perceptual contracts on the gallery\'s scatter and dot charts', () => {
  for (const file of demoBriefs()) {
    it(`${file.split('/').pop()} keeps the contracts of its form`, async () => {
      const { result, dump } = await renderDemo(file);
      if (result.choice!.form === 'scatter') {
        const plan = result.choice!.plan as ScatterPlan;
        checkScatterContracts(dump, plan.x.name, plan.y.name, plan.area?.name);
        expect(points(dump).length).toBeGreaterThan(0);
      }
      if (result.choice!.form === 'dot') {
        const plan = result.choice!.plan as DotPlan;
        const px = axisPx(dump, 'bottom');
        for (const m of points(dump)) expect(Math.abs(m.cx! - px(m.datum![m.datum!.value as string] as number))).toBeLessThanOrEqual(0.5);
        checkTexts(dump);
        expect(plan.values.length).toBeGreaterThan(0);
      }
    });
  }
});

describe('scatter contracts on edge cases', () => {
  it('values that are all zero or more get no negative ticks, and all zero or less no positive ones (regression: −250 ly on a distance axis)', async () => {
    const rows = [[4.2, 1.5], [8.6, 25], [11.4, 0.0017], [310, 120000], [860, 60000], [2600, 350000]].map(([d, l], i) => ({ star: `S${i}`, d, l, neg: -l! }));
    for (const values of [['d', 'l'], ['d', 'neg']]) {
      const r = await renderRows({ intent: 'correlation', values, fields: { d: { unit: 'ly' }, l: { unit: 'units' }, neg: { unit: 'units' } } }, rows);
      expect(r.ok).toBe(true);
      const [x, y] = [r.scene!.axes.find((a) => a.orient === 'bottom')!, r.scene!.axes.find((a) => a.orient === 'left')!];
      expect(Math.min(...(x.ticks as number[]))).toBeGreaterThanOrEqual(0);
      const yTicks = y.ticks as number[];
      if (values[1] === 'l') expect(Math.min(...yTicks)).toBeGreaterThanOrEqual(0);
      else expect(Math.max(...yTicks)).toBeLessThanOrEqual(0);
    }
  });

  it('circle area is proportional to the area value: a 4× value gets a 2× radius, r² ratio within 1 %', async () => {
    const rows = [{ x: 1, y: 1, a: 1 }, { x: 2, y: 3, a: 4 }, { x: 3, y: 2, a: 16 }, { x: 4, y: 5, a: 9 }];
    const r = await renderRows({ intent: 'correlation', values: ['x', 'y'], area: 'a' }, rows);
    const dump = dumpScene(r.scene!);
    checkScatterContracts(dump, 'x', 'y', 'a');
    const radius = (a: number) => points(dump).find((m) => m.datum!.a === a)!.r!;
    expect(radius(4) / radius(1)).toBeCloseTo(2, 2);
    expect(radius(16) / radius(4)).toBeCloseTo(2, 2);
    // The size legend's circles follow the same rule as the marks.
    const legend = dump.legends.find((l) => l.kind === 'size')!;
    const k = radius(16) ** 2 / 16;
    for (const e of legend.entries) expect(Math.abs(e.r! ** 2 / e.value! / k - 1)).toBeLessThanOrEqual(0.01);
  });

  it('shapes have equal areas, and every point states its shape and centre in the scene dump', async () => {
    const rows = ['a', 'b', 'c', 'd', 'e'].map((kind, i) => ({ x: i, y: i * i, kind }));
    const dump = dumpScene((await renderRows({ intent: 'correlation', values: ['x', 'y'], shape: 'kind' }, rows)).scene!);
    checkScatterContracts(dump, 'x', 'y');
    const marks = points(dump);
    expect(new Set(marks.map((m) => m.shape)).size).toBe(5);
    for (const m of marks) expect(m.r).toBeCloseTo(marks[0]!.r!, 9);
    expect(dump.legends.map((l) => l.kind)).toEqual(['shape']);
  });

  it('the fit line runs through the least-squares values at the ends of the data', async () => {
    const rows = [{ x: 0, y: 1 }, { x: 1, y: 3 }, { x: 2, y: 5 }, { x: 3, y: 7.5 }];
    const r = await renderRows({ intent: 'correlation', values: ['x', 'y'], fit: 'linear' }, rows);
    const dump = dumpScene(r.scene!);
    const line = dump.marks.find((m) => m.role === 'line')!;
    const [a, b] = [line.datum!.intercept as number, line.datum!.slope as number];
    const [px, py] = [axisPx(dump, 'bottom'), axisPx(dump, 'left')];
    const [, x0, y0, x1, y1] = line.d!.match(/M([\d.]+) ([\d.]+)L([\d.]+) ([\d.]+)/)!.map(Number);
    expect(x0).toBeCloseTo(px(0), 1);
    expect(y0).toBeCloseTo(py(a), 1);
    expect(x1).toBeCloseTo(px(3), 1);
    expect(y1).toBeCloseTo(py(a + 3 * b), 1);
  });

  it('a binned density conserves the points: its hexagons\' counts sum to the rows drawn', async () => {
    const rows = Array.from({ length: 12_000 }, (_, i) => ({ x: 100 + Math.cos(i) * Math.sqrt(i) * 0.1, y: 50 + Math.sin(i) * Math.sqrt(i) * 0.1 }));
    const dump = dumpScene((await renderRows({ intent: 'correlation', values: ['x', 'y'] }, rows)).scene!);
    const bins = dump.marks.filter((m) => m.role === 'bin');
    expect(bins.reduce((s, b) => s + (b.datum!.count as number), 0)).toBe(12_000);
    expect(points(dump)).toHaveLength(0);
    checkTexts(dump);
  });

  it('dumbbell lines join each key\'s two dots, and keys run in sorted order down the plot', async () => {
    const rows = [{ k: 'a', p: 3, q: 9 }, { k: 'b', p: 5, q: 4 }, { k: 'c', p: 1, q: 7 }];
    const dump = dumpScene((await renderRows({ intent: 'compare', keys: 'k', values: ['p', 'q'] }, rows)).scene!);
    const lines = dump.marks.filter((m) => m.role === 'line');
    expect(lines).toHaveLength(3);
    for (const line of lines) {
      const ends = points(dump).filter((p) => p.datum!.k === line.datum!.k).map((p) => `${p.cx},${p.cy}`);
      const [, x0, y0, x1, y1] = line.d!.match(/M([\d.]+) ([\d.]+)L([\d.]+) ([\d.]+)/)!;
      expect(ends.map((e) => e.split(',').map((v) => Number(v).toFixed(2)).join(','))).toEqual([`${Number(x0).toFixed(2)},${Number(y0).toFixed(2)}`, `${Number(x1).toFixed(2)},${Number(y1).toFixed(2)}`]);
    }
    // Sorted by the second value, largest at the top: a (9), c (7), b (4).
    const y = (d: string) => Number(d.split(/[ L]/)[1]);
    const order = [...lines].sort((l, m) => y(l.d!) - y(m.d!)).map((l) => l.datum!.k);
    expect(order).toEqual(['a', 'c', 'b']);
  });
});
