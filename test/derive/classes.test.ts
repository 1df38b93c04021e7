import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { classOf, divergingClasses, MAX_CLASSES, sequentialClasses, spreadRamp } from '../../src/derive/classes.js';
import { denseGrid } from '../../src/derive/dense-grid.js';
import { oklabLightness } from '../../src/color/oklab.js';
import { hexToRgb } from '../../src/color/srgb.js';
import { env, runs } from '../helpers.js';

const loaded = env.style('report', undefined);
if (!loaded.ok) throw new Error('the report style must load');
const style = loaded.value;
const lightness = (hex: string) => oklabLightness(hexToRgb(hex));
const sorted = (xs: number[]) => Float64Array.from(xs).sort();

describe('colour classes', () => {
  it('equal-interval classes have round boundaries covering the data', () => {
    const c = sequentialClasses(sorted([3, 17, 22, 48, 51, 64, 70, 88, 95]), style.palette.sequential);
    expect(c.method).toBe('equal-interval');
    expect(c.classes.map((k) => k.from)).toEqual([0, 20, 40, 60, 80]);
    expect(c.classes.at(-1)!.to).toBe(100);
  });

  it('a skewed distribution gets quantile classes: no class holds more than about its share', () => {
    const values = [...Array.from({ length: 90 }, (_, i) => i / 10), 500, 800, 1000];
    const c = sequentialClasses(sorted(values), style.palette.sequential);
    expect(c.method).toBe('quantile');
    const counts = c.classes.map(() => 0);
    for (const v of values) counts[classOf(c.classes, v)]!++;
    expect(Math.max(...counts)).toBeLessThanOrEqual(Math.ceil(values.length / c.classes.length) + 1);
  });

  it('with equalOnly, a skewed distribution keeps equal intervals (a dense layout in value order)', () => {
    const values = [...Array.from({ length: 90 }, (_, i) => i / 10), 500, 800, 1000];
    expect(sequentialClasses(sorted(values), style.palette.sequential, true).method).toBe('equal-interval');
  });

  it('never more than 10 classes nor more than the ramp has; lightness falls monotonically from the lowest class', () => {
    fc.assert(fc.property(fc.array(fc.double({ min: -1e6, max: 1e6, noNaN: true }), { minLength: 1, maxLength: 200 }), (xs) => {
      const s = sorted(xs);
      const c = s[0]! < 0 && s[s.length - 1]! > 0 ? divergingClasses(s[0]!, s[s.length - 1]!, 0, style.palette.diverging) : sequentialClasses(s, style.palette.sequential);
      expect(c.classes.length).toBeLessThanOrEqual(MAX_CLASSES);
      expect(c.classes.length).toBeGreaterThanOrEqual(1);
      // Every value lands in a class that covers it.
      for (const v of xs) {
        const k = c.classes[classOf(c.classes, v)]!;
        expect(v).toBeGreaterThanOrEqual(k.from - 1e-9 * Math.max(1, Math.abs(v)));
        expect(v).toBeLessThanOrEqual(k.to + 1e-9 * Math.max(1, Math.abs(v)));
      }
      if (c.method !== 'diverging') {
        const l = c.classes.map((k) => lightness(k.fill));
        l.slice(1).forEach((x, i) => expect(x).toBeLessThan(l[i]!));
      }
    }), { numRuns: runs(200) });
  });

  it('diverging classes: equal steps from the midpoint, lighter towards it on both sides, the neutral middle unused', () => {
    const c = divergingClasses(-38, 12, 0, style.palette.diverging);
    const widths = c.classes.map((k) => k.to - k.from);
    expect(new Set(widths).size).toBe(1);
    const at = c.classes.findIndex((k) => k.from === 0);
    const l = c.classes.map((k) => lightness(k.fill));
    for (let i = 1; i < at; i++) expect(l[i]).toBeGreaterThan(l[i - 1]!);
    for (let i = at + 1; i < l.length; i++) expect(l[i]).toBeLessThan(l[i - 1]!);
    // The same distance from the midpoint gets the same lightness step on either side.
    expect(Math.abs(l[at - 1]! - l[at]!)).toBeLessThan(0.02);
    const middle = style.palette.diverging[(style.palette.diverging.length - 1) / 2];
    expect(c.classes.map((k) => k.fill)).not.toContain(middle);
  });

  it('spreads k colours over a ramp from its first to its last step', () => {
    expect(spreadRamp(['a', 'b', 'c', 'd', 'e'], 3)).toEqual(['a', 'c', 'e']);
  });
});

describe('dense grid', () => {
  it('the largest whole-pixel cell that fits, in rows', () => {
    expect(denseGrid(100, 100, 100)).toEqual({ cell: 10, columns: 10, rows: 10 });
    expect(denseGrid(101, 100, 100)).toEqual({ cell: 9, columns: 11, rows: 10 });
  });

  it('nothing when even one pixel each does not hold the items', () => {
    expect(denseGrid(10_001, 100, 100)).toBeUndefined();
    expect(denseGrid(10_000, 100, 100)).toEqual({ cell: 1, columns: 100, rows: 100 });
  });
});
