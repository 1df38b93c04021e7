import { describe, expect, it } from 'vitest';
import { dumpScene } from '../../src/scene/dump.js';
import type { StackPlan } from '../../src/forms/stack-plan.js';
import { demoBriefs, renderDemo, renderRows } from '../helpers.js';
import { checkStackContracts, checkTexts, segmentsByBar } from './stack-contracts.js';

/** Visits by site and kind: uneven totals, parts in a different order in each site. */
const visits = [
  { site: 'North', kind: 'Walk-in', n: 40 }, { site: 'North', kind: 'Booked', n: 25 }, { site: 'North', kind: 'Group', n: 10 },
  { site: 'South', kind: 'Walk-in', n: 20 }, { site: 'South', kind: 'Booked', n: 45 }, { site: 'South', kind: 'Group', n: 5 },
  { site: 'East', kind: 'Walk-in', n: 12 }, { site: 'East', kind: 'Booked', n: 8 }, { site: 'East', kind: 'Group', n: 30 },
  { site: 'West', kind: 'Booked', n: 3 },
];
const brief = (intent: string, extra: Record<string, unknown> = {}) => ({ intent, keys: ['site', 'kind'], values: 'n', fields: { n: { unit: 'visits' } }, ...extra });
const opts = (normalized: boolean) => ({ group: 'site', part: 'kind', value: 'n', normalized });

describe('perceptual contracts of stacked bars', () => {
  it('segments are contiguous from zero, in one order, the largest part on the baseline, heights ∝ totals', async () => {
    const r = await renderRows(brief('composition'), visits);
    expect(r.ok).toBe(true);
    checkStackContracts(dumpScene(r.scene!), opts(false));
  });

  it('lying bars keep the same contracts', async () => {
    const long = visits.map((v) => ({ ...v, site: `${v.site} visitor centre and ranger station` }));
    const r = await renderRows(brief('composition'), long);
    expect(r.scene!.axes.find((a) => a.scale === 'band')!.orient).toBe('left');
    checkStackContracts(dumpScene(r.scene!), opts(false));
  });

  it('bars are sorted by total, largest first', async () => {
    const dump = dumpScene((await renderRows(brief('composition'), visits)).scene!);
    const totals = [...segmentsByBar(dump, 'site').values()].map((segs) => segs.reduce((s, m) => s + (m.datum!.n as number), 0));
    expect(totals).toEqual([...totals].sort((a, b) => b - a));
  });

  it('names each part inside its largest segment, and draws no legend when every name fits', async () => {
    const r = await renderRows(brief('composition'), visits);
    const labels = dumpScene(r.scene!).texts.filter((t) => t.role === 'label').map((t) => t.text).sort();
    expect(labels).toEqual(['Booked', 'Group', 'Walk-in']);
    expect(r.scene!.legends).toEqual([]);
  });

  it('draws a legend of every part when some name fits in no segment', async () => {
    const r = await renderRows(brief('composition', { size: { width: 300, height: 200 } }), visits);
    expect(r.ok).toBe(true);
    expect(r.scene!.legends).toHaveLength(1);
    expect(r.scene!.legends[0]!.entries.map((e) => e.label)).toEqual(['Booked', 'Walk-in', 'Group']);
    checkStackContracts(dumpScene(r.scene!), opts(false));
  });
});

describe('an ordered part key keeps its order', () => {
  it('a scale from low to high is stacked low to high in every bar, whatever the sizes', async () => {
    const levels = ['Poor', 'Fair', 'Good'];
    const rows = ['North', 'South'].flatMap((site, i) => levels.map((kind, j) => ({ site, kind, n: [5, 30, 10][(i + j) % 3]! })));
    const r = await renderRows(brief('part-to-whole', { fields: { n: { unit: 'visits' }, kind: { type: 'ordinal', order: levels } } }), rows);
    expect(r.rationale.some((d) => d.decision === 'parts of `kind` stacked in their own order in every bar, "Poor" on the baseline')).toBe(true);
    checkStackContracts(dumpScene(r.scene!), { ...opts(true), partOrder: levels });
    expect(r.scene!.legends[0]!.entries.map((e) => e.label)).toEqual(levels);
  });
});

describe('perceptual contracts of normalized bars', () => {
  it('every bar reaches 100 % within 0.5 px, shares sum to 1 within 1e-9, segments contiguous, largest part on the baseline', async () => {
    const r = await renderRows(brief('part-to-whole'), visits);
    expect(r.ok).toBe(true);
    const dump = dumpScene(r.scene!);
    checkStackContracts(dump, opts(true));
    expect(dump.legends).toHaveLength(1);
  });

  it('bars are ordered by the share of the baseline part, largest first', async () => {
    const dump = dumpScene((await renderRows(brief('part-to-whole'), visits)).scene!);
    const shares = [...segmentsByBar(dump, 'site').values()].map((segs) => (segs.find((m) => m.datum!.kind === 'Booked')?.datum!.share as number | undefined) ?? 0);
    expect(shares).toEqual([...shares].sort((a, b) => b - a));
  });

  it('holds for shares that do not add up exactly in floating point (thirds, tenths)', async () => {
    const rows = ['A', 'B', 'C', 'D'].flatMap((g, i) => ['x', 'y', 'z'].map((p, j) => ({ site: g, kind: p, n: 0.1 * (i + 1) + j / 3 })));
    const r = await renderRows(brief('part-to-whole'), rows);
    checkStackContracts(dumpScene(r.scene!), opts(true));
  });

  it('percent labels sit inside their segments and overlap nothing', async () => {
    const dump = dumpScene((await renderRows(brief('part-to-whole'), visits)).scene!);
    const segs = dump.marks.filter((m) => m.role === 'segment');
    const labels = dump.texts.filter((t) => t.role === 'label');
    expect(labels.length).toBeGreaterThan(0);
    for (const l of labels) {
      expect(l.text).toMatch(/^(<1|\d+)%$/);
      expect(segs.some((s) => l.x >= s.x! && l.y >= s.y! && l.x + l.width <= s.x! + s.width! && l.y + l.height <= s.y! + s.height!)).toBe(true);
    }
    checkTexts(dump);
  });

  it('folded parts keep the contracts, with "Other" last in every bar', async () => {
    const rows = ['A', 'B', 'C'].flatMap((g) => Array.from({ length: 11 }, (_, j) => ({ site: g, kind: `Part ${j}`, n: 20 - j })));
    const r = await renderRows(brief('part-to-whole'), rows);
    const dump = dumpScene(r.scene!);
    checkStackContracts(dump, opts(true));
    for (const segs of segmentsByBar(dump, 'site').values()) expect(segs.at(-1)!.datum!.kind).toBe('Other');
    expect(dump.texts.some((t) => t.role === 'note' && t.text.includes('"Other" holds the'))).toBe(true);
  });

  it('one key: bars of shares on a percent axis, each datum with its value and share, shares summing to 1', async () => {
    const rows = [{ kind: 'Walk-in', n: 40 }, { kind: 'Booked', n: 25 }, { kind: 'Group', n: 10 }];
    const r = await renderRows({ intent: 'part-to-whole', keys: 'kind', values: 'n', fields: { n: { unit: 'visits' } } }, rows);
    const dump = dumpScene(r.scene!);
    const bars = dump.marks.filter((m) => m.role === 'bar');
    expect(bars.map((b) => b.datum)).toEqual([{ kind: 'Walk-in', share: 40 / 75, n: 40 }, { kind: 'Booked', share: 25 / 75, n: 25 }, { kind: 'Group', share: 10 / 75, n: 10 }]);
    expect(Math.abs(bars.reduce((s, b) => s + (b.datum!.share as number), 0) - 1)).toBeLessThanOrEqual(1e-9);
    const axis = dump.axes.find((a) => a.scale === 'linear')!;
    expect(axis.title).toBe('Share of n (%)');
    expect(dump.texts.filter((t) => t.role === 'tick' && t.text.endsWith('%')).length).toBeGreaterThan(1);
    checkTexts(dump);
  });
});

describe('perceptual contracts of the donut', () => {
  it('each wedge\'s angle is its share: wedges meet end to end round one full turn from 12 o\'clock', async () => {
    const rows = [{ kind: 'Walk-in', n: 40 }, { kind: 'Booked', n: 25 }, { kind: 'Group', n: 10 }];
    const r = await renderRows({ intent: 'part-to-whole', form: 'donut', keys: 'kind', values: 'n', fields: { n: { unit: 'visits' } } }, rows);
    expect(r.ok).toBe(true);
    const dump = dumpScene(r.scene!);
    const wedges = dump.marks.filter((m) => m.role === 'segment');
    expect(wedges.map((w) => w.datum!.kind)).toEqual(['Walk-in', 'Booked', 'Group']);
    expect(Math.abs(wedges.reduce((s, w) => s + (w.datum!.share as number), 0) - 1)).toBeLessThanOrEqual(1e-9);
    expect(dump.legends[0]!.entries.map((e) => e.label)).toEqual(['Walk-in', 'Booked', 'Group']);
    checkTexts(dump);
  });
});

describe('the stack contracts can fail (a check that cannot fail is no check)', () => {
  it('catches a gap between segments, a bar short of 100 % and parts out of order', async () => {
    const dump = dumpScene((await renderRows(brief('part-to-whole'), visits)).scene!);
    const south = (d: typeof dump) => d.marks.filter((m) => m.role === 'segment' && m.datum!.site === 'South');
    const gap = structuredClone(dump);
    south(gap).at(-1)!.y! -= 3;
    expect(() => checkStackContracts(gap, opts(true))).toThrow();
    const swapped = structuredClone(dump);
    const [a, b] = south(swapped);
    [a!.datum!.kind, b!.datum!.kind] = [b!.datum!.kind!, a!.datum!.kind!];
    expect(() => checkStackContracts(swapped, opts(true))).toThrow();
  });
});

describe('stack contracts on the gallery\'s stacked and normalized charts', () => {
  for (const file of demoBriefs()) {
    it(`${file.split('/').pop()} keeps them, if it stacks`, async () => {
      const { result, dump } = await renderDemo(file);
      const plan = result.choice!.plan as { kind?: string; stacks?: StackPlan } & Partial<StackPlan>;
      const stack = result.choice!.form === 'stacked-bar' ? (plan as StackPlan) : plan.kind === 'stacks' ? plan.stacks! : undefined;
      if (!stack) return;
      checkStackContracts(dump, { group: stack.group.name, part: stack.part.name, value: stack.value!.name, normalized: stack.normalized });
    });
  }
});
