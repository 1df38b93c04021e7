import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { binValues, countInBins, nearestNiceStep, stepMultiple } from '../../src/derive/bins.js';
import { runs } from '../helpers.js';

const sorted = (xs: number[]) => [...xs].sort((a, b) => a - b);

describe('histogram bins', () => {
  it('edges sit at multiples of a nice width: 0.1 × 3 is written 0.3', () => {
    expect(stepMultiple(3, { mantissa: 1, exponent: -1 })).toBe(0.3);
    expect(stepMultiple(7, { mantissa: 2, exponent: 2 })).toBe(1400);
  });

  it('the nice step nearest a width, by ratio: 3.3 is nearer 5 (×1.52) than 2 (×1.65)', () => {
    expect(nearestNiceStep(3.3)).toEqual({ mantissa: 5, exponent: 0 });
    expect(nearestNiceStep(0.13)).toEqual({ mantissa: 1, exponent: -1 });
    expect(nearestNiceStep(8)).toEqual({ mantissa: 1, exponent: 1 });
  });

  it('a value on an inner edge belongs to the bin it opens; the greatest value is in the last, closed bin', () => {
    expect(countInBins([0, 1, 2, 2, 3, 4], [0, 2, 4])).toEqual([2, 4]);
  });

  it('falls back to Sturges when the IQR is zero', () => {
    const b = binValues(sorted([5, 5, 5, 5, 5, 5, 5, 0, 10]), 200)!;
    expect(b.rule).toBe('sturges');
    // Sturges: range 10 over ⌈log₂ 9⌉ + 1 = 5 bins is 2, already nice.
    expect(b.rawWidth).toBe(2);
    expect(b.width).toBe(2);
  });

  it('one repeated value still gets one bin around it', () => {
    const b = binValues([7, 7, 7], 200)!;
    expect(b.rule).toBe('single-value');
    expect(b.counts).toEqual([3]);
    expect(b.edges[0]!).toBeLessThanOrEqual(7);
    expect(b.edges[1]!).toBeGreaterThan(7);
  });

  it('widens the nice width while more bins than the most drawn would be needed, and says so', () => {
    // A tight core and a far tail: the Freedman–Diaconis width would need thousands of bins.
    const values = sorted([...Array.from({ length: 100 }, (_, i) => i / 100), 10000]);
    const b = binValues(values, 50)!;
    expect(b.widened).toBe(true);
    expect(b.counts.length).toBeLessThanOrEqual(50);
    expect(b.counts.reduce((a, c) => a + c, 0)).toBe(101);
  });

  it('values spanning more than a double holds are refused (undefined), not binned into nonsense', () => {
    expect(binValues([-1.7e308, 1.7e308], 200)).toBeUndefined();
  });

  it('property: any finite sample bins without throwing, every value in exactly one bin whose edges hold it', () => {
    const sample = fc.array(fc.oneof(fc.double({ noNaN: true, noDefaultInfinity: true, min: -1e12, max: 1e12 }), fc.integer({ min: -50, max: 50 }), fc.double({ noNaN: true, noDefaultInfinity: true })), { minLength: 1, maxLength: 300 });
    fc.assert(fc.property(sample, (xs) => {
      const s = sorted(xs);
      const b = binValues(s, 200);
      if (!b) {
        // Refused only when the span is beyond a double, or too fine for doubles to hold distinct edges
        // (subnormal widths, values a trillion times larger than their spread, or an edge past the largest double).
        const span = s[s.length - 1]! - s[0]!;
        const magnitude = Math.max(Math.abs(s[0]!), Math.abs(s[s.length - 1]!));
        expect(!Number.isFinite(span) || span < 1e-290 || magnitude / span > 1e12 || magnitude > 1e307).toBe(true);
        return;
      }
      expect(b.counts.reduce((a, c) => a + c, 0)).toBe(s.length);
      expect(b.edges.length).toBe(b.counts.length + 1);
      expect(b.edges[0]!).toBeLessThanOrEqual(s[0]!);
      expect(b.edges[b.edges.length - 1]!).toBeGreaterThanOrEqual(s[s.length - 1]!);
      for (let i = 1; i < b.edges.length; i++) expect(b.edges[i]!).toBeGreaterThan(b.edges[i - 1]!);
    }), { numRuns: runs(300) });
  });
});
