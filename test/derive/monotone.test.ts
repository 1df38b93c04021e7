import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { hermiteAt, monotoneTangents } from '../../src/derive/monotone.js';
import { runs } from '../helpers.js';

describe('monotone cubic interpolation (Steffen 1990)', () => {
  it('between two points the curve never leaves the interval of their values, so non-negative data stay non-negative', () => {
    const data = fc.array(fc.tuple(fc.double({ min: 0.1, max: 10, noNaN: true }), fc.double({ min: 0, max: 1000, noNaN: true })), { minLength: 2, maxLength: 20 });
    fc.assert(fc.property(data, (pairs) => {
      const xs: number[] = [];
      pairs.reduce((x, [dx]) => (xs.push(x + dx), x + dx), 0);
      const ys = pairs.map((p) => p[1]);
      const t = monotoneTangents(xs, ys);
      let worst = 0;
      for (let i = 0; i + 1 < xs.length; i++) {
        const [lo, hi] = [Math.min(ys[i]!, ys[i + 1]!), Math.max(ys[i]!, ys[i + 1]!)];
        for (let s = 0; s <= 20; s++) {
          const y = hermiteAt(xs[i]!, xs[i + 1]!, ys[i]!, ys[i + 1]!, t[i]!, t[i + 1]!, xs[i]! + ((xs[i + 1]! - xs[i]!) * s) / 20);
          worst = Math.max(worst, (lo - y) / (1 + hi), (y - hi) / (1 + hi));
        }
      }
      expect(worst).toBeLessThanOrEqual(1e-9);
    }), { numRuns: runs(200) });
  });

  it('passes through its points and is flat at a local extremum', () => {
    const [xs, ys] = [[0, 1, 2, 3], [0, 5, 2, 2]];
    const t = monotoneTangents(xs, ys);
    expect(t[1]).toBe(0);
    expect(t[2]).toBe(0);
    expect(hermiteAt(0, 1, 0, 5, t[0]!, t[1]!, 1)).toBeCloseTo(5, 12);
  });

  it('a straight line is kept straight', () => {
    const t = monotoneTangents([0, 1, 3, 4], [1, 3, 7, 9]);
    for (const v of t) expect(v).toBeCloseTo(2, 12);
  });
});
