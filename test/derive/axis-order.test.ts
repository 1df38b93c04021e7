import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { axisFlips, greedyAxisOrder, neighbourStrength } from '../../src/derive/axis-order.js';
import { runs } from '../helpers.js';

/** A symmetric matrix from its upper triangle, row by row. */
function symmetric(n: number, upper: number[]): number[][] {
  const m: number[][] = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => (i === j ? 1 : 0)));
  let k = 0;
  for (let i = 0; i < n; i++) for (let j = i + 1; j < n; j++) m[i]![j] = m[j]![i] = upper[k++]!;
  return m;
}

function permutations(xs: number[]): number[][] {
  if (xs.length <= 1) return [xs];
  return xs.flatMap((x, i) => permutations([...xs.slice(0, i), ...xs.slice(i + 1)]).map((p) => [x, ...p]));
}

describe('axis order for parallel coordinates', () => {
  it('a chain of strong correlations hidden in a shuffled order is found: 0–3 (0.9), 3–1 (−0.8), 1–2 (0.7)', () => {
    // pairs: 01 02 03 12 13 23
    const r = symmetric(4, [0.1, 0.2, 0.9, 0.7, -0.8, 0.05]);
    const order = greedyAxisOrder(r);
    expect([order, [...order].reverse()]).toContainEqual([0, 3, 1, 2]);
  });

  it('every attribute appears exactly once, and the order never has weaker neighbours than the order given', () => {
    const matrix = fc.integer({ min: 2, max: 7 }).chain((n) => fc.array(fc.double({ min: -1, max: 1, noNaN: true }), { minLength: (n * (n - 1)) / 2, maxLength: (n * (n - 1)) / 2 }).map((u) => symmetric(n, u)));
    fc.assert(fc.property(matrix, (r) => {
      const order = greedyAxisOrder(r);
      expect([...order].sort((a, b) => a - b)).toEqual(r.map((_, i) => i));
      // Greedy keeps at least the strongest pair, so it never does worse than that pair alone.
      const strongest = Math.max(...r.flatMap((row, i) => row.filter((_, j) => j > i).map(Math.abs)));
      expect(neighbourStrength(order, r)).toBeGreaterThanOrEqual(strongest - 1e-12);
    }), { numRuns: runs(200) });
  });

  it('greedy reaches at least 80% of the best order by brute force on random matrices of 5 attributes (common practice: greedy is near-optimal, not optimal)', () => {
    const matrix = fc.array(fc.double({ min: -1, max: 1, noNaN: true }), { minLength: 10, maxLength: 10 }).map((u) => symmetric(5, u));
    fc.assert(fc.property(matrix, (r) => {
      const best = Math.max(...permutations([0, 1, 2, 3, 4]).map((p) => neighbourStrength(p, r)));
      expect(neighbourStrength(greedyAxisOrder(r), r)).toBeGreaterThanOrEqual(0.8 * best - 1e-12);
    }), { numRuns: runs(100) });
  });

  it('an axis is flipped when its correlation with its left neighbour, as drawn, is negative', () => {
    const r = symmetric(3, [-0.9, 0.2, -0.8]);
    // Order 0,1,2: 1 flipped (r01 < 0); r12 < 0 but 1 is flipped, so 2 reads positive and is not.
    expect(axisFlips([0, 1, 2], r)).toEqual([false, true, false]);
    expect(axisFlips([0, 2, 1], r)).toEqual([false, false, true]);
  });
});
