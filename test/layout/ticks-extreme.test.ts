import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { niceTicks } from '../../src/layout/ticks.js';
import { tickFormatter, valueFormatter } from '../../src/layout/number-format.js';
import { runs } from '../helpers.js';

const MAX = Number.MAX_VALUE;
/** Doubles of every magnitude, with the ends of the range (largest, smallest normal, denormal) often. */
const extreme = fc.oneof(
  fc.double({ noNaN: true, noDefaultInfinity: true }),
  fc.constantFrom(MAX, -MAX, 1.7e308, -1.7e308, 1e308, -1e308, 9e307, 2.2250738585072014e-308, 5e-324, -5e-324, 1e-300, -1e-300, 0, 1, -1),
  fc.double({ min: -1e9, max: 1e9, noNaN: true }),
);
const range = fc.tuple(extreme, extreme).map(([a, b]) => (a <= b ? [a, b] : [b, a]) as [number, number]);
const SPECIFIERS = ['.0%', '.1%', '.2p', ',.2f', '.2s', '.3~g', 'e', ',d', '$,.0f', '+.1f'];

describe('property: ticks and labels at the ends of the doubles', () => {
  it('are finite, ascending, evenly spaced and cover any range of finite doubles', () => {
    fc.assert(fc.property(range, fc.integer({ min: 2, max: 10 }), ([lo, hi], m) => {
      const ticks = niceTicks(lo, hi, m, true);
      expect(ticks.length).toBeGreaterThanOrEqual(2);
      expect(ticks.every(Number.isFinite)).toBe(true);
      // Steps compared at half size: near ±1.8e308 a full difference would overflow.
      const half = ticks.map((t) => t / 2);
      const step = half[1]! - half[0]!;
      for (let i = 1; i < ticks.length; i++) {
        expect(ticks[i]!).toBeGreaterThan(ticks[i - 1]!);
        expect(Math.abs(half[i]! - half[i - 1]! - step)).toBeLessThanOrEqual(Math.abs(step) * 1e-9);
      }
      // Values below 1e-300 are zero for any chart (see niceTicks).
      const slack = Math.max(1e-300, Math.max(Math.abs(lo), Math.abs(hi)) * 1e-12);
      expect(ticks[0]!).toBeLessThanOrEqual(lo + slack);
      expect(ticks[ticks.length - 1]!).toBeGreaterThanOrEqual(hi - slack);
    }), { numRuns: runs(3000) });
  });

  it('are labelled distinctly, without Infinity or NaN, by default and by any specifier', () => {
    fc.assert(fc.property(range, fc.integer({ min: 2, max: 10 }), fc.constantFrom(...SPECIFIERS), ([lo, hi], m, specifier) => {
      const ticks = niceTicks(lo, hi, m, true);
      const labels = ticks.map(tickFormatter(ticks));
      expect(new Set(labels).size).toBe(ticks.length);
      for (const label of [...labels, ...ticks.map(tickFormatter(ticks, specifier))]) expect(label).not.toMatch(/Infinity|NaN/);
    }), { numRuns: runs(2000) });
  });

  it('label data values without Infinity, NaN, or an exponent before a scale word', () => {
    fc.assert(fc.property(fc.array(extreme, { minLength: 1, maxLength: 8 }), fc.option(fc.constantFrom(...SPECIFIERS)), (values, specifier) => {
      const format = valueFormatter(values, specifier ?? undefined);
      for (const v of values) expect(format(v)).not.toMatch(/Infinity|NaN|e[+\u2212-]?\d+(bn|M)/);
    }), { numRuns: runs(2000) });
  });
});

describe('regressions at the ends of the doubles', () => {
  it('labels data up to 1.7e308 with finite ticks, never "Infinity" (a nice tick of 2e308 overflowed)', () => {
    const ticks = niceTicks(0, 1.7e308, 5, true);
    expect(ticks.every(Number.isFinite)).toBe(true);
    expect(ticks[ticks.length - 1]).toBe(1.75e308);
    expect(ticks.map(tickFormatter(ticks))).toEqual(['0', '2.5e+307', '5e+307', '7.5e+307', '1e+308', '1.25e+308', '1.5e+308', '1.75e+308']);
  });

  it('computes ticks in a scaled space where max − min overflows to Infinity', () => {
    const ticks = niceTicks(-1.7e308, 1.7e308, 5, true);
    expect(ticks).toEqual([-1.75e308, -1.25e308, -7.5e307, -2.5e307, 2.5e307, 7.5e307, 1.25e308, 1.75e308]);
  });

  it('falls back to the data\'s own extent where no round tick fits below the largest double', () => {
    expect(niceTicks(0, MAX, 5, true)).toEqual([0, MAX]);
    expect(niceTicks(-MAX, MAX, 5, true)).toEqual([-MAX, MAX]);
  });

  it('gives finite ticks for a NaN or infinite bound, a defect upstream that must not reach the SVG', () => {
    expect(niceTicks(0, Number.NaN, 5, true)).toEqual([0, 0.25, 0.5, 0.75, 1]);
    expect(niceTicks(-Infinity, Infinity, 5, true)).toEqual([-MAX, MAX]);
  });

  it('writes a percent beyond 1.8e306 in exponent form, not "Infinity%"', () => {
    const ticks = niceTicks(0, 1.7e308, 5, true);
    expect(tickFormatter(ticks, '.0%')(1.75e308)).toBe('1.75e+310%');
    expect(valueFormatter([-1.7e308], '.1%')(-1.7e308)).toBe('\u22121.7e+310%');
    expect(valueFormatter([0.5], '.0%')(0.5)).toBe('50%');
  });

  it('writes a 1e308 value in exponent form, not "1e+299bn"', () => {
    expect(valueFormatter([1e308, 5])(1e308)).toBe('1e+308');
    expect(valueFormatter([1.2345e300])(1.2345e300)).toBe('1.23e+300');
    expect(tickFormatter([0, 5e20, 1e21])(5e20)).toBe('5e+20');
  });

  it('labels ticks near 1e-300 apart (every one read "0")', () => {
    const ticks = niceTicks(0, 1e-300, 5, true);
    expect(ticks.map(tickFormatter(ticks))).toEqual(['0', '2.5e\u2212301', '5e\u2212301', '7.5e\u2212301', '1e\u2212300']);
  });

  it('labels micro-scale ticks as they are (2.5e-7 read "3e-7")', () => {
    const ticks = [0, 2.5e-7, 5e-7, 7.5e-7, 1e-6];
    expect(ticks.map(tickFormatter(ticks))).toEqual(['0', '2.5e\u22127', '5e\u22127', '7.5e\u22127', '1e\u22126']);
  });
});
