import { describe, expect, it } from 'vitest';
import { AGGREGATORS } from '../../src/derive/aggregate.js';

describe('aggregators', () => {
  // Exact arithmetic gives these; naive left-to-right summation loses them to rounding.
  it('sum with compensation: 1e16 + 1 − 1e16 is 1, not 0', () => {
    expect(AGGREGATORS.sum.combine([1e16, 1, -1e16])).toBe(1);
  });

  it('mean with compensation: the mean of 1e16, 1 and −1e16 is 1/3', () => {
    expect(AGGREGATORS.mean.combine([1e16, 1, -1e16])).toBeCloseTo(1 / 3, 12);
  });

  it('the mean of values near the largest double stays finite', () => {
    expect(AGGREGATORS.mean.combine([1e308, 1e308])).toBe(1e308);
  });

  it('count, max and min over a list longer than the call stack allows to spread', () => {
    const long = Array.from({ length: 300_000 }, (_, i) => i % 1000);
    expect(AGGREGATORS.count.combine(long)).toBe(300_000);
    expect(AGGREGATORS.max.combine(long)).toBe(999);
    expect(AGGREGATORS.min.combine(long)).toBe(0);
  });

  it('says which results add up again (into an "Others" bar, a stack)', () => {
    expect(Object.entries(AGGREGATORS).filter(([, a]) => a.additive).map(([k]) => k)).toEqual(['sum', 'count']);
  });
});
