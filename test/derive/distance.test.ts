import { describe, expect, it } from 'vitest';
import { distanceMatrix, standardizeRows } from '../../src/derive/distance.js';

const rows = (...r: number[][]) => r.map((x) => Float64Array.from(x));

describe('distances between rows', () => {
  it('Euclidean distance of complete rows is the straight-line distance', () => {
    const { d } = distanceMatrix(rows([0, 0], [3, 4]), 'euclidean');
    expect(d[1]).toBe(5);
  });

  it('a missing cell is left out of the pair and the sum scaled up by p / used (as R\'s dist does)', () => {
    // R documentation of stats::dist: "the sum is scaled up proportionally to the number of columns used".
    const m = distanceMatrix(rows([0, 0, NaN], [3, 4, 7]), 'euclidean');
    expect(m.d[1]).toBeCloseTo(Math.sqrt((25 * 3) / 2), 12);
    expect(m.partialPairs).toBe(1);
  });

  it('a pair that shares no cell gets the largest distance found, never zero', () => {
    const m = distanceMatrix(rows([1, NaN], [NaN, 2], [1, 5], [1, 2]), 'euclidean');
    expect(m.undefinedPairs).toBe(1);
    expect(m.d[0 * 4 + 1]).toBe(Math.max(...Array.from(m.d).filter((x, i) => i !== 1 && i !== 4)));
  });

  it('correlation distance is 1 − Pearson r: 0 for rows that rise together, 2 for opposite ones', () => {
    const { d } = distanceMatrix(rows([1, 2, 3], [10, 20, 30], [3, 2, 1]), 'correlation');
    expect(d[0 * 3 + 1]).toBeCloseTo(0, 12);
    expect(d[0 * 3 + 2]).toBeCloseTo(2, 12);
  });

  it('standardized rows have mean 0 and standard deviation 1; a constant row becomes zeros', () => {
    const [a, b] = standardizeRows(rows([2, 4, 6, NaN], [5, 5, 5, 5]));
    expect(Array.from(a!.slice(0, 3))).toEqual([-1, 0, 1]);
    expect(a![3]).toBeNaN();
    expect(Array.from(b!)).toEqual([0, 0, 0, 0]);
  });
});
