import { quantile } from 'd3-array';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { freedmanDiaconisWidth } from '../../src/derive/bins.js';
import { quantileSorted7 } from '../../src/derive/quantile.js';
import { runs } from '../helpers.js';

const asc = (xs: readonly number[]) => [...xs].sort((a, b) => a - b);
const PS = [0.1, 0.25, 0.5, 0.75, 0.9];

describe('type-7 quantiles against outside sources', () => {
  // REFERENCES §10: Hyndman & Fan 1996 definition 7; the worked values agree in R quantile(type = 7),
  // d3-array, mathjs, simple-statistics 7.12.1 and jStat.
  const worked: [string, number[], number[]][] = [
    ['1…10', [1, 2, 3, 4, 5, 6, 7, 8, 9, 10], [1.9, 3.25, 5.5, 7.75, 9.1]],
    ["Anscombe's y_I", [8.04, 6.95, 7.58, 8.81, 8.33, 9.96, 7.24, 4.26, 10.84, 4.82, 5.68], [4.82, 6.315, 7.58, 8.57, 9.96]],
    ['1, 2, 3, 4', [1, 2, 3, 4], [1.3, 1.75, 2.5, 3.25, 3.7]],
  ];
  for (const [name, data, expected] of worked) {
    it(`${name}: p = 0.1, 0.25, 0.5, 0.75, 0.9 give the worked values of REFERENCES §10`, () => {
      const got = PS.map((p) => quantileSorted7(asc(data), p));
      got.forEach((q, i) => expect(q).toBeCloseTo(expected[i]!, 12));
    });
  }

  it('agree with d3-array 3.2.4 `quantile` (R-7 by its documentation) on random samples', () => {
    // d3-array: a general-purpose reference library; its quantile uses the R-7 method.
    const sample = fc.array(fc.double({ min: -1e6, max: 1e6, noNaN: true }), { minLength: 1, maxLength: 200 });
    fc.assert(fc.property(sample, fc.double({ min: 0, max: 1, noNaN: true }), (xs, p) => {
      const ours = quantileSorted7(asc(xs), p);
      const theirs = quantile(xs, p)!;
      expect(Math.abs(ours - theirs)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(theirs)));
    }), { numRuns: runs(300) });
  });
});

describe('Freedman–Diaconis bin width against its published formula', () => {
  it('width = 2 · IQR · n^(−1/3) on a fixed sample (Freedman & Diaconis 1981)', () => {
    // Sample 1…10: IQR (type 7) = 7.75 − 3.25 = 4.5 (REFERENCES §10), n = 10, so the width is
    // 2 × 4.5 / 10^(1/3) = 9 / 2.154434690031884 = 4.177429950…
    expect(freedmanDiaconisWidth([1, 2, 3, 4, 5, 6, 7, 8, 9, 10])).toBeCloseTo(4.177429950, 8);
  });

  it("on Anscombe's y_I: IQR 8.57 − 6.315 = 2.255, n = 11: 2 × 2.255 / 11^(1/3) = 2.027896…", () => {
    // Quartiles from REFERENCES §10; 11^(1/3) = 2.223980091.
    const yI = asc([8.04, 6.95, 7.58, 8.81, 8.33, 9.96, 7.24, 4.26, 10.84, 4.82, 5.68]);
    expect(freedmanDiaconisWidth(yI)).toBeCloseTo(4.51 / 2.223980091, 8);
  });
});
