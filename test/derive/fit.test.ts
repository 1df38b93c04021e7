import { describe, expect, it } from 'vitest';
import { leastSquares } from '../../src/derive/fit.js';

describe('leastSquares', () => {
  it('recovers an exact line: slope, intercept and r = 1 (or −1 when falling)', () => {
    const xs = [1, 2, 3, 4, 5];
    const up = leastSquares(xs, xs.map((x) => 2 + 3 * x))!;
    expect([up.slope, up.intercept, up.r, up.n]).toEqual([3, 2, 1, 5]);
    const down = leastSquares(xs, xs.map((x) => 10 - x))!;
    expect(down.slope).toBeCloseTo(-1, 12);
    expect(down.r).toBeCloseTo(-1, 14);
  });

  it('keeps precision at large offsets (sums are taken about the means)', () => {
    const xs = [1e9 + 1, 1e9 + 2, 1e9 + 3, 1e9 + 4];
    const fit = leastSquares(xs, xs.map((x) => 0.5 * (x - 1e9) + 7))!;
    expect(fit.slope).toBeCloseTo(0.5, 9);
    expect(fit.r).toBeCloseTo(1, 12);
  });

  it('gives no line for fewer than 3 points or a constant x or y', () => {
    expect(leastSquares([1, 2], [3, 4])).toBeUndefined();
    expect(leastSquares([2, 2, 2], [1, 2, 3])).toBeUndefined();
    expect(leastSquares([1, 2, 3], [5, 5, 5])).toBeUndefined();
  });
});
