import { stack, stackOffsetWiggle, stackOrderNone } from 'd3-shape';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { streamBaseline, weightedWiggle, weightedWiggleSlope, wiggle, wiggleSlope } from '../../src/derive/wiggle.js';
import { runs } from '../helpers.js';

describe('wiggle-minimising baselines', () => {
  // REFERENCES §7, Byron & Wattenberg (2008): n = 3 with f′ = (1, 0, −2) gives g0′ = −0.25, and
  // the wiggle is then 2.75, against 3.00 for the zero baseline and 5.00 for the symmetric one.
  it('the unweighted wiggle baseline of the worked case is g0′ = −0.25 with wiggle 2.75', () => {
    const df = [1, 0, -2];
    expect(wiggleSlope(df)).toBeCloseTo(-0.25, 12);
    expect(wiggle(-0.25, df)).toBeCloseTo(2.75, 12);
    expect(wiggle(0, df)).toBeCloseTo(3, 12);
    // ThemeRiver's symmetric baseline g0 = −½Σf_i, so g0′ = −½Σf_i′ = 0.5.
    expect(wiggle(0.5, df)).toBeCloseTo(5, 12);
  });

  it('perturbing the unweighted optimum by ±ε never lowers the wiggle (REFERENCES §7)', () => {
    fc.assert(fc.property(fc.array(fc.double({ min: -100, max: 100, noNaN: true }), { minLength: 1, maxLength: 12 }), fc.double({ min: 1e-3, max: 10, noNaN: true }), (df, eps) => {
      const g = wiggleSlope(df);
      expect(wiggle(g + eps, df)).toBeGreaterThanOrEqual(wiggle(g, df) - 1e-9);
      expect(wiggle(g - eps, df)).toBeGreaterThanOrEqual(wiggle(g, df) - 1e-9);
    }), { numRuns: runs(200) });
  });

  it('perturbing the weighted optimum by ±ε never lowers the weighted wiggle', () => {
    const layer = fc.tuple(fc.double({ min: 0, max: 100, noNaN: true }), fc.double({ min: -50, max: 50, noNaN: true }));
    fc.assert(fc.property(fc.array(layer, { minLength: 1, maxLength: 12 }), fc.double({ min: 1e-3, max: 10, noNaN: true }), (layers, eps) => {
      const [f, df] = [layers.map((l) => l[0]), layers.map((l) => l[1])];
      const g = weightedWiggleSlope(f, df);
      const w = weightedWiggle(g, f, df);
      expect(weightedWiggle(g + eps, f, df)).toBeGreaterThanOrEqual(w - 1e-6 * (1 + w));
      expect(weightedWiggle(g - eps, f, df)).toBeGreaterThanOrEqual(w - 1e-6 * (1 + w));
    }), { numRuns: runs(200) });
  });

  it('a single layer of equal thickness everywhere has a flat weighted baseline (its midline does not move)', () => {
    expect(weightedWiggleSlope([4], [2])).toBeCloseTo(-1, 12);
    expect(weightedWiggleSlope([0, 0], [0, 0])).toBe(0);
  });

  it('the stream baseline is centred: the lowest baseline and the highest top are symmetric about zero', () => {
    const layers = [[1, 3, 2, 0], [2, 2, 5, 1], [0, 1, 1, 4]];
    const g0 = streamBaseline(layers);
    const tops = g0.map((g, k) => g + layers.reduce((a, l) => a + l[k]!, 0));
    expect(Math.min(...g0) + Math.max(...tops)).toBeCloseTo(0, 12);
    expect(g0).toHaveLength(4);
  });

  it('the stream baseline rises and falls as d3-shape\'s stackOffsetWiggle does (same weighted wiggle, same layer order)', () => {
    const table = fc.integer({ min: 2, max: 6 }).chain((n) => fc.array(fc.array(fc.double({ min: 0, max: 100, noNaN: true }), { minLength: n, maxLength: n }), { minLength: 2, maxLength: 15 }));
    fc.assert(fc.property(table, (rows) => {
      // d3-shape 3.2.0 stackOffsetWiggle: the reference implementation of Byron & Wattenberg's weighted wiggle.
      const keys = rows[0]!.map((_, i) => i);
      const d3 = stack<number[], number>().keys(keys).value((row, i) => row[i]!).order(stackOrderNone).offset(stackOffsetWiggle)(rows);
      const ours = streamBaseline(keys.map((i) => rows.map((r) => r[i]!)));
      for (let k = 1; k < rows.length; k++) {
        const theirs = d3[0]![k]![0] - d3[0]![k - 1]![0];
        expect(ours[k]! - ours[k - 1]!).toBeCloseTo(theirs, 6);
      }
    }), { numRuns: runs(100) });
  });
});
