import { describe, expect, it } from 'vitest';
import type { GroupedBarPlan } from '../../src/forms/grouped-bar-plan.js';
import { dumpScene, type SceneDump } from '../../src/scene/dump.js';
import { renderDemo, renderRows, root } from '../helpers.js';

/**
 * Contracts of a grouped bar chart (upright): one zero baseline, bar length ∝ value within 0.5 px,
 * every key's bars in the plan's group order left to right, one colour per group matching the
 * legend, and no two texts overlapping.
 */
function checkGrouped(dump: SceneDump, plan: GroupedBarPlan, valueName: string) {
  const axis = dump.axes.find((a) => a.orient === 'left')!;
  const [d0, d1] = axis.domain as number[];
  expect(d0).toBeLessThanOrEqual(0);
  const px = (v: number) => axis.range[0] + ((v - d0!) * (axis.range[1] - axis.range[0])) / (d1! - d0!);
  const perUnit = Math.abs(axis.range[1] - axis.range[0]) / (d1! - d0!);
  const bars = dump.marks.filter((m) => m.role === 'bar');
  for (const b of bars) {
    const v = b.datum![valueName] as number;
    expect(Math.abs(b.height! - Math.abs(v) * perUnit)).toBeLessThanOrEqual(0.5);
    expect(Math.abs((v >= 0 ? b.y! + b.height! : b.y!) - px(0))).toBeLessThanOrEqual(0.5);
  }
  expect(dump.marks.filter((m) => m.role === 'zero-line')).toHaveLength(1);
  const keys = [...new Set(bars.map((b) => String(b.datum![plan.key.name])))];
  for (const key of keys) {
    const own = bars.filter((b) => b.datum![plan.key.name] === key).sort((a, b) => a.x! - b.x!);
    const groups = own.map((b) => String(b.datum![plan.group.name]));
    expect(groups).toEqual(plan.groups.filter((g) => groups.includes(g)));
  }
  const legend = dump.legends[0]!;
  expect(legend.entries.map((e) => e.label)).toEqual(plan.groups);
  for (const b of bars) expect(b.fill).toBe(legend.entries.find((e) => e.label === b.datum![plan.group.name])!.fill);
  expect(new Set(legend.entries.map((e) => e.fill)).size).toBe(plan.groups.length);
}

describe('grouped bars: perceptual contracts', () => {
  it('the gallery chart keeps a zero baseline, proportional lengths and one group order in every key', async () => {
    const { result, dump } = await renderDemo(`${root}/demo-data/harbour-moorings.yaml`);
    checkGrouped(dump, result.choice!.plan as GroupedBarPlan, 'moorings');
    expect(dump.form).toBe('grouped-bar');
  });

  it('negative values hang from the same zero line, and a missing combination leaves its slot empty', async () => {
    const rows = [{ k: 'A', g: 'x', v: 5 }, { k: 'A', g: 'y', v: -3 }, { k: 'B', g: 'x', v: 2 }, { k: 'B', g: 'z', v: 4 }, { k: 'C', g: 'y', v: 1 }];
    const r = await renderRows({ intent: 'compare', keys: ['k', 'g'], values: 'v', fields: { v: { unit: 'u' } } }, rows);
    const dump = dumpScene(r.scene!);
    const plan = r.choice!.plan as GroupedBarPlan;
    checkGrouped(dump, plan, 'v');
    expect(dump.marks.filter((m) => m.role === 'bar')).toHaveLength(5);
    // B has no y: its x and z bars keep their own slots, with y's slot left empty between or beside them.
    const slot = (g: string) => plan.groups.indexOf(g);
    const b = dump.marks.filter((m) => m.role === 'bar' && m.datum!.k === 'B').sort((p, q) => p.x! - q.x!);
    expect(b[1]!.x! - b[0]!.x!).toBeCloseTo((slot(String(b[1]!.datum!.g)) - slot(String(b[0]!.datum!.g))) * b[0]!.width!, 6);
    expect(plan.groups).toEqual(['x', 'z', 'y']);
    // C has only y, the last group: it stands in the last slot of C's band, the first two left empty.
    const bottom = dump.axes.find((a) => a.orient === 'bottom')!;
    const centre = bottom.tickPositions[(bottom.ticks as string[]).indexOf('C')]!;
    const c = dump.marks.find((m) => m.role === 'bar' && m.datum!.k === 'C')!;
    expect(c.x! - (centre - 1.5 * c.width!)).toBeCloseTo(2 * c.width!, 2);
  });

  it('keys sorted by value use each key\'s total over its groups; groups keep their order in every key', async () => {
    const rows = [{ k: 'A', g: 'x', v: 1 }, { k: 'A', g: 'y', v: 1 }, { k: 'B', g: 'x', v: 9 }, { k: 'B', g: 'y', v: 0 }, { k: 'C', g: 'x', v: 3 }, { k: 'C', g: 'y', v: 4 }];
    const r = await renderRows({ intent: 'compare', keys: ['k', 'g'], values: 'v', fields: { v: { unit: 'u' } } }, rows);
    const dump = dumpScene(r.scene!);
    expect(dump.axes.find((a) => a.orient === 'bottom')!.domain).toEqual(['B', 'C', 'A']);
    checkGrouped(dump, r.choice!.plan as GroupedBarPlan, 'v');
  });
});
