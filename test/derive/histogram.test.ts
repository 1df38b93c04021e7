import { describe, expect, it } from 'vitest';
import { histogram } from '../../src/derive/histogram.js';
import { translucency } from '../../src/derive/translucency.js';

describe('histogram and translucency', () => {
  it('bins on round boundaries hold every value once', () => {
    const values = [1, 2, 2, 3, 3, 3, 4, 4, 4, 4, 9.5];
    const bins = histogram(values, 10);
    expect(bins.reduce((a, b) => a + b.count, 0)).toBe(values.length);
    for (const b of bins) expect(Number.isInteger(b.from * 2)).toBe(true);
    expect(histogram([5, 5, 5], 10)).toEqual([{ from: 5, to: 5, count: 3 }]);
  });

  it('opacity is 1 for a handful of marks, falls as 1/√n, and stops at its floor', () => {
    expect(translucency(10)).toBe(1);
    expect(translucency(400)).toBeCloseTo(0.2, 12);
    expect(translucency(1600) / translucency(400)).toBeCloseTo(0.5, 12);
    expect(translucency(1e9)).toBe(0.05);
  });
});
