import { linearRegression, sampleCorrelation } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { leastSquares } from '../../src/derive/fit.js';

// Anscombe's quartet: F. J. Anscombe, "Graphs in Statistical Analysis", The American
// Statistician 27(1):17–21, 1973, as transcribed in /work/shared/REFERENCES.md §10.
const X = [10, 8, 13, 9, 11, 14, 6, 4, 12, 7, 5];
const QUARTET = {
  I: { x: X, y: [8.04, 6.95, 7.58, 8.81, 8.33, 9.96, 7.24, 4.26, 10.84, 4.82, 5.68], r: 0.816421, a: 3.000091, b: 0.500091 },
  II: { x: X, y: [9.14, 8.14, 8.74, 8.77, 9.26, 8.10, 6.13, 3.10, 9.13, 7.26, 4.74], r: 0.816237, a: 3.000909, b: 0.5 },
  III: { x: X, y: [7.46, 6.77, 12.74, 7.11, 7.81, 8.84, 6.08, 5.39, 8.15, 6.42, 5.73], r: 0.816287, a: 3.002455, b: 0.499727 },
  IV: { x: [8, 8, 8, 8, 8, 8, 8, 19, 8, 8, 8], y: [6.58, 5.76, 7.71, 8.84, 8.47, 7.04, 5.25, 12.50, 5.56, 7.91, 6.89], r: 0.816521, a: 3.001727, b: 0.499909 },
};

describe('least squares and Pearson r on Anscombe\'s quartet', () => {
  for (const [name, set] of Object.entries(QUARTET)) {
    it(`set ${name}: line and r agree with simple-statistics 7.12.1 and the published table`, () => {
      const fit = leastSquares(set.x, set.y)!;
      // Reference library: simple-statistics (linearRegression, sampleCorrelation).
      const ref = linearRegression(set.x.map((x, i) => [x, set.y[i]!]));
      expect(fit.slope).toBeCloseTo(ref.m, 12);
      expect(fit.intercept).toBeCloseTo(ref.b, 12);
      expect(fit.r).toBeCloseTo(sampleCorrelation(set.x, set.y), 12);
      // REFERENCES §10 table (simple-statistics, jstat and R agree), printed to 6 decimals.
      expect(fit.r).toBeCloseTo(set.r, 6);
      expect(fit.intercept).toBeCloseTo(set.a, 6);
      expect(fit.slope).toBeCloseTo(set.b, 6);
      expect(fit.n).toBe(11);
    });
  }

  it('set I: r matches R\'s cor() to 10 digits (REFERENCES §10: 0.8164205163)', () => {
    expect(leastSquares(QUARTET.I.x, QUARTET.I.y)!.r).toBeCloseTo(0.8164205163, 10);
  });
});
