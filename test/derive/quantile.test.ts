import { describe, expect, it } from 'vitest';
import { boxStats, quantileSorted7 } from '../../src/derive/quantile.js';

describe('type-7 quantiles and box numbers', () => {
  it('a quantile between two order statistics interpolates linearly: (n − 1)p = 1.5 lands halfway between x1 and x2', () => {
    // h = (4 − 1) × 0.5 = 1.5, so halfway between 20 and 40.
    expect(quantileSorted7([10, 20, 40, 80], 0.5)).toBe(30);
  });

  it('p = 0 and p = 1 are the least and greatest values; one value is every quantile', () => {
    expect(quantileSorted7([3, 5, 9], 0)).toBe(3);
    expect(quantileSorted7([3, 5, 9], 1)).toBe(9);
    expect(quantileSorted7([7], 0.3)).toBe(7);
    expect(quantileSorted7([], 0.5)).toBeNaN();
  });

  it('equal neighbours near the largest double give their value, not NaN', () => {
    expect(quantileSorted7([1.7e308, 1.7e308, 1.7e308], 0.25)).toBe(1.7e308);
  });

  it('whiskers stop at the most extreme value inside 1.5 IQR of the box; values beyond are outliers', () => {
    // Sorted 1…9 and 30: q1 = 3.25, q3 = 7.75, IQR = 4.5, upper fence 14.5, lower fence −3.5.
    const s = boxStats([1, 2, 3, 4, 5, 6, 7, 8, 9, 30]);
    expect([s.q1, s.median, s.q3]).toEqual([3.25, 5.5, 7.75]);
    expect(s.low).toBe(1);
    expect(s.high).toBe(9);
    expect(s.outliers).toEqual([30]);
    expect(s.n).toBe(10);
  });

  it('a whisker never reaches inside the box: with every value outside the fence on one side, it ends at the quartile', () => {
    const s = boxStats([0, 10, 10, 10, 10, 10, 10, 10, 100]);
    expect([s.q1, s.q3]).toEqual([10, 10]);
    expect([s.low, s.high]).toEqual([10, 10]);
    expect(s.outliers).toEqual([0, 100]);
  });
});
