import fc from 'fast-check';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { createTextMemo, WIDTH_CACHE_MAX_TEXT } from '../../src/font/measurer.js';
import type { FontMetrics } from '../../src/font/metrics.js';
import type { Weight } from '../../src/style/types.js';
import { env, root, runs } from '../helpers.js';

/**
 * Pieces of text that stress a run: kerning pairs (AV, T., ’,), combining marks of zero
 * advance, a character outside the BMP and one outside the font (both .notdef), white space of
 * several kinds, the ellipsis and its kerning.
 */
const PIECES = ['A', 'V', 'T', '.', ',', '\u2019', 'f', 'i', 'W', 'a', 'y', 'o', ' ', '  ', '\t', '\u00a0', '\u0301', '\u{1F600}', '\u6e2f', '\u2026', '"', 'P'];
const text = fc.array(fc.constantFrom(...PIECES), { maxLength: 30 }).map((a) => a.join(''));
const weight = fc.constantFrom<Weight>('regular', 'semibold');

describe('text ruler', () => {
  it('measures any run of a text exactly as measuring that run on its own', () => {
    const sample = fc.record({ text, weight, size: fc.constantFrom(11, 12, 14, 17.5), suffix: fc.constantFrom(undefined, '…', 'V', '\u{1F600}'), a: fc.nat(), b: fc.nat() });
    fc.assert(fc.property(sample, ({ text, weight, size, suffix, a, b }) => {
      const r = env.measure.ruler(text, size, weight);
      const points = [...text];
      expect(r.length).toBe(points.length);
      const [start, end] = [a % (r.length + 1), b % (r.length + 1)].sort((x, y) => x - y) as [number, number];
      expect(r.slice(start, end)).toBe(points.slice(start, end).join(''));
      expect(points.map((_, i) => r.codePoint(i))).toEqual(points.map((p) => p.codePointAt(0)));
      // Exactly equal, not close: a width one ulp off could move a line break and change a golden.
      expect(r.width(start, end, suffix)).toBe(env.measure.width(r.slice(start, end) + (suffix ?? ''), size, weight));
    }), { numRuns: runs(2000) });
  });
});

describe('font metrics that make fitting by search exact', () => {
  for (const weight of ['regular', 'semibold'] as const) {
    const metrics = JSON.parse(readFileSync(join(root, 'templates', 'fonts', `source-sans-3-${weight}.metrics.json`), 'utf8')) as FontMetrics;
    const advances = new Map<number, number>();
    for (let i = 0; i < metrics.advances.length; i += 2) advances.set(metrics.advances[i]!, metrics.advances[i + 1]!);

    it(`${weight}: holds only whole font units, so sums of advances are exact in doubles`, () => {
      expect([...metrics.advances, ...metrics.kerning, metrics.notdefAdvance].every(Number.isInteger)).toBe(true);
    });

    it(`${weight}: never lets a kerning pair outweigh its glyph's advance, so a longer prefix is never narrower`, () => {
      expect(metrics.notdefAdvance).toBeGreaterThan(0);
      expect([...advances.values()].every((a) => a >= 0)).toBe(true);
      const outweighed: number[][] = [];
      for (let i = 0; i < metrics.kerning.length; i += 3) {
        const [first, second, kern] = metrics.kerning.slice(i, i + 3) as [number, number, number];
        if (!((advances.get(second) ?? -Infinity) + kern >= 0)) outweighed.push([first, second, kern]);
      }
      expect(outweighed).toEqual([]);
    });
  }
});

describe('width memory', () => {
  it('remembers short texts and never stores a long one (caching every piece of a 100 kB label held gigabytes)', () => {
    let computed = 0;
    const memo = createTextMemo((t) => (computed++, t.length));
    const long = 'x'.repeat(WIDTH_CACHE_MAX_TEXT + 1);
    expect([memo.get(long), memo.get(long)]).toEqual([long.length, long.length]);
    expect([computed, memo.size]).toEqual([2, 0]);
    expect([memo.get('North pier'), memo.get('North pier')]).toEqual([10, 10]);
    expect([computed, memo.size]).toEqual([3, 1]);
  });

  it('holds a bounded number of texts however many are measured', () => {
    const memo = createTextMemo((t) => t.length);
    for (let i = 0; i < 120_000; i++) memo.get(`label ${i}`);
    expect(memo.size).toBeLessThanOrEqual(50_000);
  });
});
