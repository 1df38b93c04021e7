import { describe, expect, it } from 'vitest';
import { dumpScene } from '../../src/scene/dump.js';
import { renderRows } from '../helpers.js';
import { checkLineContracts, lines } from './line-contracts.js';

const quarters = ['2024-01', '2024-04', '2024-07', '2024-10', '2025-01'];
const rows = [
  ...quarters.map((q, i) => ({ quarter: q, port: 'Large', tonnes: 4000 * (1 + 0.05 * i) })),
  ...quarters.map((q, i) => ({ quarter: q, port: 'Small', tonnes: 120 * (1 + 0.2 * i) })),
];
const brief = { intent: 'change', keys: ['quarter', 'port'], values: 'tonnes', fields: { tonnes: { unit: 't' } } };

describe('index line contracts', () => {
  for (const as of ['index', 'percent'] as const) {
    it(`every series passes through exactly ${as === 'index' ? '100' : '0 %'} at the base, on the reference line (as: ${as})`, async () => {
      const r = await renderRows({ ...brief, index: { base: 'Q2 2024', as } }, rows);
      expect(r.ok, JSON.stringify(r.diagnostics)).toBe(true);
      const dump = dumpScene(r.scene!);
      const reference = dump.marks.find((m) => m.role === 'reference')!;
      const refY = Number(reference.d!.split(' ')[1]!.split('L')[0]);
      for (const l of lines(dump)) {
        const at = l.points!.find((p) => p.datum!.quarter === 'Apr 2024')!;
        expect(at.datum![as === 'index' ? 'index' : 'change_percent']).toBe(as === 'index' ? 100 : 0);
        expect(Math.abs(at.y - refY)).toBeLessThanOrEqual(0.01);
      }
      expect(dump.axes.find((a) => a.orient === 'left')!.title).toBe(as === 'index' ? 'Index, Q2 2024 = 100' : '% change since Q2 2024');
      expect(dump.texts.some((t) => t.role === 'label' && t.text.includes('Q2 2024'))).toBe(true);
      // Quarterly keys are read, and ticked, as quarters.
      expect(dump.texts.filter((t) => t.role === 'tick' && /\d{4}/.test(t.text)).map((t) => t.text)).toEqual(['Q1 2024', 'Q2 2024', 'Q3 2024', 'Q4 2024', 'Q1 2025']);
      checkLineContracts(dump);
    });
  }

  it('makes each line\'s end height proportional to its index change, and keeps the raw value in the datum', async () => {
    const r = await renderRows({ ...brief, index: { base: 'first' } }, rows);
    const dump = dumpScene(r.scene!);
    const [a, b] = lines(dump).map((l) => ({ first: l.points![0]!, last: l.points![l.points!.length - 1]! }));
    // Pixels per index point, from each line's rise over its index change: one scale for both.
    const k = (s: typeof a) => (s!.first.y - s!.last.y) / ((s!.last.datum!.index as number) - 100);
    expect(Math.abs(k(a) - k(b))).toBeLessThan(1e-3);
    expect(a!.last.datum!.index).toBeCloseTo(120, 9);
    expect(b!.last.datum!.index).toBeCloseTo(180, 9);
    expect(a!.last.datum!.tonnes).toBe(4800);
    expect(r.rationale.some((d) => /leave zero out/.test(d.decision))).toBe(true);
  });

  it('finds the base by its quarter, its month, or its ISO date alike, and reads free text in no time zone', async () => {
    const titles = await Promise.all(['Q2 2024', 'Apr 2024', '2024-04', '2024-04-01'].map(async (base) => {
      const r = await renderRows({ ...brief, index: { base } }, rows);
      return dumpScene(r.scene!).axes.find((a) => a.orient === 'left')!.title;
    }));
    expect(titles).toEqual(Array(4).fill('Index, Q2 2024 = 100'));
    // "April 1, 2024" is no key as written, and is not guessed at through the local time zone.
    const free = await renderRows({ ...brief, index: { base: 'April 1, 2024' } }, rows);
    expect(free.diagnostics).toMatchObject([{ code: 'derive.index-base-missing', path: '/index/base' }]);
  });
});
