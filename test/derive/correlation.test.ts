import fc from 'fast-check';
import { sampleCorrelation } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { correlationMatrix, pearson } from '../../src/derive/correlation.js';
import { runs } from '../helpers.js';

// Anscombe's quartet (F. J. Anscombe, The American Statistician 27(1), 1973), as REFERENCES §10 gives it.
const X = [10, 8, 13, 9, 11, 14, 6, 4, 12, 7, 5];
const Y1 = [8.04, 6.95, 7.58, 8.81, 8.33, 9.96, 7.24, 4.26, 10.84, 4.82, 5.68];
const Y2 = [9.14, 8.14, 8.74, 8.77, 9.26, 8.10, 6.13, 3.10, 9.13, 7.26, 4.74];
const Y3 = [7.46, 6.77, 12.74, 7.11, 7.81, 8.84, 6.08, 5.39, 8.15, 6.42, 5.73];
const X4 = [8, 8, 8, 8, 8, 8, 8, 19, 8, 8, 8];
const Y4 = [6.58, 5.76, 7.71, 8.84, 8.47, 7.04, 5.25, 12.50, 5.56, 7.91, 6.89];

describe('Pearson correlation', () => {
  it('matches the Anscombe quartet values of REFERENCES §10 (simple-statistics 7.12.1, jstat and R agree)', () => {
    expect(pearson(X, Y1)).toBeCloseTo(0.816421, 6);
    expect(pearson(X, Y2)).toBeCloseTo(0.816237, 6);
    expect(pearson(X, Y3)).toBeCloseTo(0.816287, 6);
    expect(pearson(X4, Y4)).toBeCloseTo(0.816521, 6);
  });

  it('agrees with simple-statistics sampleCorrelation on random samples', () => {
    // Values on a 1/8 grid: no subnormal spreads, where both implementations lose every digit.
    const value = fc.integer({ min: -8000, max: 8000 }).map((v) => v / 8);
    const pairs = fc.array(fc.tuple(value, value), { minLength: 3, maxLength: 60 });
    fc.assert(fc.property(pairs, (ps) => {
      const [xs, ys] = [ps.map((p) => p[0]), ps.map((p) => p[1])];
      const ours = pearson(xs, ys);
      const theirs = sampleCorrelation(xs, ys);
      // simple-statistics 7.12.1 is the outside reference; a constant sample has no r in either (NaN there, NaN here).
      if (!Number.isFinite(theirs) || Math.abs(theirs) > 1 + 1e-9) return;
      expect(Number.isNaN(ours)).toBe(false);
      expect(ours).toBeCloseTo(theirs, 6);
    }), { numRuns: runs(200) });
  });

  it('is undefined for a constant sample and ±1 for exact lines', () => {
    expect(pearson([1, 1, 1], [1, 2, 3])).toBeNaN();
    expect(pearson([1, 2, 3, 4], [3, 5, 7, 9])).toBeCloseTo(1, 12);
    expect(pearson([1, 2, 3, 4], [9, 7, 5, 3])).toBeCloseTo(-1, 12);
  });

  it('the matrix is symmetric with ones on the diagonal', () => {
    const m = correlationMatrix([X, Y1, Y2]);
    expect(m[0]![0]).toBe(1);
    expect(m[1]![0]).toBe(m[0]![1]);
    expect(m[2]![1]).toBe(m[1]![2]);
  });
});
