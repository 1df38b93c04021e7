import { scaleBand } from 'd3-scale';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { bandScale } from '../../src/layout/scales.js';
import { runs } from '../helpers.js';

describe('band scale', () => {
  // Reference: d3-scale's scaleBand with paddingInner(p), paddingOuter(p / 2), align 0.5, the
  // scale chartwright's band axes were first drawn with; every bar's position must stay exact.
  const reference = (domain: string[], range: [number, number], padding: number) =>
    scaleBand<string>().domain(domain).range(range).paddingInner(padding).paddingOuter(padding / 2);

  it('places every band exactly where d3-scale scaleBand places it, ranges reversed and categories repeated included', () => {
    const domain = fc.array(fc.constantFrom('a', 'b', 'c', 'd', 'e', 'f', 'g', 'h', 'Alder Hut', ''), { maxLength: 60 });
    const end = fc.double({ min: -5000, max: 5000, noNaN: true });
    fc.assert(fc.property(domain, end, end, fc.double({ min: 0, max: 1.2, noNaN: true }), (cats, r0, r1, padding) => {
      const ours = bandScale(cats, [r0, r1], padding);
      const d3 = reference(cats, [r0, r1], padding);
      expect(ours.domain).toEqual(d3.domain());
      expect(ours.step).toBe(d3.step());
      expect(ours.bandwidth).toBe(d3.bandwidth());
      for (const c of cats) {
        expect(ours.start(c)).toBe(d3(c));
        expect(ours.center(c)).toBe(d3(c)! + d3.bandwidth() / 2);
      }
    }), { numRuns: runs(300) });
  });

  it('gives no position to a category outside its domain', () => {
    expect(bandScale(['a', 'b'], [0, 100], 0.2).start('z')).toBeNaN();
  });
});
