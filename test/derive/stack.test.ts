import { fsum } from 'd3-array';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { foldParts, MAX_PARTS } from '../../src/derive/fold-parts.js';
import { fitStacks } from '../../src/derive/stack-fit.js';
import { cellsOf, keepLargest, normalizeStacks, orderStacks, partOrder, stackCells, type StackCell } from '../../src/derive/stack.js';
import type { DerivedStacks, StackQuery } from '../../src/derive/stacks.js';
import { runs } from '../helpers.js';

const cell = (group: string, part: string, value: number, row = 1): StackCell => ({ group, part, value, rows: [row] });
const cells = [cell('A', 'x', 1, 1), cell('A', 'y', 5, 2), cell('B', 'y', 2, 3), cell('B', 'x', 4, 4), cell('B', 'z', 1, 5), cell('C', 'z', 3, 6)];

describe('stacking', () => {
  it('combines each (group, part) group of rows into one cell', () => {
    const groups = [{ labels: ['A', 'x'], sortKeys: [0, 0], values: [1, 2], rows: [1, 2] }, { labels: ['A', 'y'], sortKeys: [0, 1], values: [4], rows: [3] }];
    expect(cellsOf(groups, (v) => v.reduce((a, b) => a + b, 0))).toEqual([{ group: 'A', part: 'x', value: 3, rows: [1, 2] }, { group: 'A', part: 'y', value: 4, rows: [3] }]);
  });

  it('orders parts by overall total, largest first, ties by label', () => {
    // y: 7, x: 5, z: 4.
    expect(partOrder(cells)).toEqual(['y', 'x', 'z']);
    expect(partOrder([cell('A', 'b', 2), cell('A', 'a', 2)])).toEqual(['a', 'b']);
  });

  it('keeps an ordered part key\'s own order (a scale from low to high), whatever the sizes', () => {
    const rank = { z: 0, x: 1, y: 2 } as Record<string, number>;
    expect(partOrder(cells, (p) => rank[p]!)).toEqual(['z', 'x', 'y']);
  });

  it('lays each stack\'s segments end to end from zero in the part order, a missing part getting no segment', () => {
    const stacks = stackCells(cells, ['y', 'x', 'z']);
    expect(stacks.map((s) => [s.group, s.total, s.segments.map((g) => [g.part, g.start, g.end])])).toEqual([
      ['A', 6, [['y', 0, 5], ['x', 5, 6]]],
      ['B', 7, [['y', 0, 2], ['x', 2, 6], ['z', 6, 7]]],
      ['C', 3, [['z', 0, 3]]],
    ]);
  });

  it('normalizes every stack to end at exactly 1, each segment starting where the one below ends', () => {
    const stacks = normalizeStacks(stackCells(cells, ['y', 'x', 'z']));
    for (const s of stacks) {
      expect(s.segments[0]!.start).toBe(0);
      expect(s.segments.at(-1)!.end).toBe(1);
      for (let i = 1; i < s.segments.length; i++) expect(s.segments[i]!.start).toBe(s.segments[i - 1]!.end);
    }
    expect(stacks[1]!.segments.map((g) => g.share)).toEqual([2 / 7, 4 / 7, 1 / 7]);
  });

  it('property: any non-negative cells normalize to shares summing to 1 within 1e-9, contiguous, ending at 1', () => {
    const arb = fc.array(fc.record({ group: fc.constantFrom('A', 'B', 'C'), part: fc.constantFrom('p', 'q', 'r', 's'), value: fc.double({ min: 1e-6, max: 1e12, noNaN: true }) }), { minLength: 1, maxLength: 30 });
    fc.assert(fc.property(arb, (raw) => {
      const unique = [...new Map(raw.map((c) => [`${c.group}/${c.part}`, cell(c.group, c.part, c.value)])).values()];
      for (const s of normalizeStacks(stackCells(unique, partOrder(unique)))) {
        expect(Math.abs(fsum(s.segments, (g) => g.share) - 1)).toBeLessThanOrEqual(1e-9);
        expect(s.segments.at(-1)!.end).toBe(1);
        for (let i = 1; i < s.segments.length; i++) expect(s.segments[i]!.start).toBe(s.segments[i - 1]!.end);
      }
    }), { numRuns: runs(200) });
  });

  it('orders stacks by total, by the baseline part\'s share, by label, by key order, or as given', () => {
    const stacks = stackCells(cells, ['y', 'x', 'z']);
    const groups = (order: Parameters<typeof orderStacks>[1]) => orderStacks(normalizeStacks(stacks), order, ['y', 'x', 'z'], (g) => ({ A: 2, B: 0, C: 1 })[g]!).map((s) => s.group);
    expect(orderStacks(stacks, 'total', [], () => 0).map((s) => s.group)).toEqual(['B', 'A', 'C']);
    // Share of y: A 5/6, B 2/7, C 0.
    expect(groups('baseline-share')).toEqual(['A', 'B', 'C']);
    expect(groups('key')).toEqual(['B', 'C', 'A']);
    expect(groups('label')).toEqual(['A', 'B', 'C']);
    expect(groups('data')).toEqual(['A', 'B', 'C']);
  });
});

describe('folding parts into "Other"', () => {
  const many = (n: number) => ['G', 'H'].flatMap((g) => Array.from({ length: n }, (_, i) => cell(g, `Part ${String(i).padStart(2, '0')}`, 100 - i, i)));

  it('keeps up to 12 parts unfolded', () => {
    expect(MAX_PARTS).toBe(12);
    const out = foldParts(many(12));
    expect(out.folded).toEqual([]);
    expect(out.parts).toHaveLength(12);
  });

  it('beyond 12, keeps the 11 largest and folds the rest into "Other", last, each group\'s total unchanged', () => {
    const input = many(15);
    const out = foldParts(input);
    expect(out.parts).toHaveLength(12);
    expect(out.parts.at(-1)).toBe('Other');
    expect(out.folded).toEqual(['Part 11', 'Part 12', 'Part 13', 'Part 14']);
    for (const g of ['G', 'H']) {
      expect(fsum(out.cells.filter((c) => c.group === g), (c) => c.value)).toBe(fsum(input.filter((c) => c.group === g), (c) => c.value));
      expect(out.cells.find((c) => c.group === g && c.part === 'Other')!.value).toBe(89 + 88 + 87 + 86);
    }
  });

  it('folds the smallest of an ordered part key, keeping the order of those kept', () => {
    const out = foldParts(many(5), 3, (p) => -Number(p.slice(5)));
    expect(out.parts).toEqual(['Part 01', 'Part 00', 'Other']);
    expect(out.folded).toEqual(['Part 02', 'Part 03', 'Part 04']);
  });

  it('folds at a smaller limit (what the palette tells apart), and names "Other" apart from a real part of that name', () => {
    const input = [...many(4), cell('G', 'Other', 1000)];
    const out = foldParts(input, 3);
    expect(out.parts).toEqual(['Other', 'Part 00', 'Other (2)']);
    expect(out.folded).toEqual(['Part 01', 'Part 02', 'Part 03']);
  });
});

describe('fitting stacks to the bars the plot holds', () => {
  const ref = (name: string) => ({ name, label: name, type: 'categorical' as const, unit: undefined, format: undefined, levels: [] });
  const query = (order: StackQuery['order']): StackQuery => ({ group: ref('g'), part: ref('p'), value: undefined, aggregate: 'sum', order, normalized: false, partLimit: 9, partOrder: 'size' });
  const derived = (order: StackQuery['order']): DerivedStacks => {
    const stacks = stackCells(cells, ['y', 'x', 'z']);
    return { query: query(order), stacks, parts: ['y', 'x', 'z'], folded: [], other: 'Other', empty: [], dropped: [], valueName: 'count' };
  };

  it('keeps the stacks with the largest totals, in their given order', () => {
    const { kept, dropped } = keepLargest(stackCells(cells, ['y', 'x', 'z']), 2);
    expect(kept.map((s) => s.group)).toEqual(['A', 'B']);
    expect(dropped).toEqual(['C']);
  });

  it('leaves all stacks when they fit, drops the smallest with a warning when not, settling on the room the note leaves', () => {
    expect(fitStacks(derived('total'), () => 3)).toMatchObject({ ok: true, diagnostics: [] });
    // With the note, the plot holds one bar fewer: the settled capacity is 1.
    const fitted = fitStacks(derived('total'), (d) => (d.dropped.length ? 1 : 2));
    expect(fitted.ok && fitted.value.stacks.map((s) => s.group)).toEqual(['B']);
    expect(fitted.ok && fitted.value.dropped).toEqual(['A', 'C']);
    expect(fitted.diagnostics).toMatchObject([{ code: 'derive.others-folded', field: 'g', expected: 'at most 1' }]);
  });

  it('refuses to leave groups of an ordered key out', () => {
    expect(fitStacks(derived('key'), () => 2).diagnostics).toMatchObject([{ code: 'derive.too-many-ordered-bars', field: 'g' }]);
  });
});
