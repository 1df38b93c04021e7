import { describe, expect, it } from 'vitest';
import { extendedLabelling, niceTicks, ticksOf } from '../../src/layout/ticks.js';
import { tickFormatter, valueFormatter } from '../../src/layout/number-format.js';

describe('extended Wilkinson ticks', () => {
  // Talbot, Lin & Hanrahan 2010, Fig. 1, and the first author's R package `labeling` 0.4.2
  // function extended(), as tabulated in ../shared/REFERENCES.md §5b.
  const published: [number, number, number, boolean, number[], number][] = [
    [8.1, 14.1, 4, false, [8, 10, 12, 14], 0.636111],
    [8.1, 14.1, 4, true, [7.5, 10, 12.5, 15], 0.275],
    [105, 543, 5, false, [100, 200, 300, 400, 500], 0.598566],
    [2.04, 2.16, 5, false, [2.04, 2.07, 2.1, 2.13, 2.16], 0.5],
    [0, 1, 5, false, [0, 0.25, 0.5, 0.75, 1], 0.85],
    [3.7, 96.2, 5, false, [0, 25, 50, 75, 100], 0.817123],
    [-0.085, 0.173, 5, false, [-0.1, 0, 0.1, 0.2], 0.690013],
    [0.5, 2.5, 5, false, [0.5, 1, 1.5, 2, 2.5], 0.7],
  ];
  for (const [dmin, dmax, m, loose, ticks, score] of published) {
    it(`labels ${dmin}–${dmax} with m = ${m}${loose ? ', loose' : ''} as the reference code does`, () => {
      const l = extendedLabelling(dmin, dmax, m, loose)!;
      expect(ticksOf(l)).toEqual(ticks);
      expect(l.score).toBeCloseTo(score, 6);
    });
  }

  it('reproduces Heckbert\'s loose labels where the two algorithms agree', () => {
    // Heckbert, "Nice Numbers for Graph Labels", Graphics Gems 1990: 105–543 → 100 … 600 by 100
    // (book text), −0.085–0.173 → −0.1 … 0.2 (computed from label.c; R labeling agrees).
    expect(niceTicks(105, 543, 5, true)).toEqual([100, 200, 300, 400, 500, 600]);
    expect(niceTicks(-0.085, 0.173, 5, true)).toEqual([-0.1, 0, 0.1, 0.2]);
  });

  it('does not give Heckbert\'s answer where the paper shows extended does better', () => {
    // Talbot et al. 2010, Fig. 1: Heckbert labels 8.1–14.1 (m = 4) as 5, 10, 15; extended as 8, 10, 12, 14.
    expect(niceTicks(8.1, 14.1, 4)).not.toEqual([5, 10, 15]);
  });

  it('widens a single value so one bar still gets an axis from zero', () => {
    expect(niceTicks(0, 0, 5, true)).toEqual([0, 0.25, 0.5, 0.75, 1]);
    const t = niceTicks(0, 7, 5, true);
    expect(t[0]).toBe(0);
    expect(t[t.length - 1]).toBeGreaterThanOrEqual(7);
  });

  it('finds the same nice steps at micro and mega scale as at unit scale', () => {
    expect(niceTicks(0, 1e-9, 5, true)).toEqual([0, 2.5e-10, 5e-10, 7.5e-10, 1e-9]);
    expect(niceTicks(0, 1e12, 5, true)).toEqual([0, 2.5e11, 5e11, 7.5e11, 1e12]);
  });

  it('treats denormal values as zero rather than drawing an axis of −5e-324 … 0', () => {
    // Found by the property test on bar layout.
    expect(niceTicks(-5e-324, 5e-324, 5, true)).toEqual([0, 0.25, 0.5, 0.75, 1]);
  });

  it('returns at once for a span too narrow for doubles to label (it used to search for minutes)', () => {
    // Found by the property test: 1e-6 at 1e9 is a relative span of 1e-15.
    const ticks = niceTicks(1e9, 1e9 + 1e-6, 5, true);
    expect(ticks[0]).toBe(0);
    expect(ticks[ticks.length - 1]).toBeGreaterThanOrEqual(1e9);
  });

  it('labels values near the smallest doubles, with ticks that stay apart (found by the property test)', () => {
    const ticks = niceTicks(0, 1e-300, 5, true);
    expect(ticks[0]).toBe(0);
    expect(new Set(ticks).size).toBe(ticks.length);
    expect(ticks[ticks.length - 1]).toBeGreaterThanOrEqual(1e-300);
  });

  it('writes tick values without float noise', () => {
    expect(niceTicks(0, 0.3, 4, true).every((t) => String(t).length < 6)).toBe(true);
  });
});

describe('number formats', () => {
  it('uses just enough decimals and groups thousands', () => {
    expect([0, 2500, 5000].map(tickFormatter([0, 2500, 5000]))).toEqual(['0', '2,500', '5,000']);
    expect([0, 0.25, 0.5].map(tickFormatter([0, 0.25, 0.5]))).toEqual(['0', '0.25', '0.50']);
  });

  it('writes millions and billions with m and bn', () => {
    expect(tickFormatter([0, 2e6, 4e6])(2e6)).toBe('2m');
    expect(tickFormatter([0, 1.5e9, 3e9])(1.5e9)).toBe('1.5bn');
  });

  it('writes negatives with a true minus sign', () => {
    expect(tickFormatter([-4, 0, 4])(-4)).toBe('\u22124');
  });

  it('writes micro-scale ticks in exponent form rather than rows of zeros (found by the property test)', () => {
    const ticks = niceTicks(0, 1e-6, 5, true);
    const labels = ticks.map(tickFormatter(ticks));
    expect(new Set(labels).size).toBe(ticks.length);
    expect(labels[0]).toBe('0');
    expect(labels[labels.length - 1]).toBe('1e\u22126');
  });

  it('labels tiny values with significant digits, never as 0.00', () => {
    expect(valueFormatter([0.000001, 0.0000025])(0.0000025)).toBe('0.0000025');
    expect(valueFormatter([0.004])(0.004)).toBe('0.004');
  });

  it('honours a d3-format specifier from the brief', () => {
    expect(valueFormatter([0.5], '.0%')(0.5)).toBe('50%');
  });

  it('shows data values with up to two decimals', () => {
    expect(valueFormatter([1.234, 2])(1.234)).toBe('1.23');
    expect(valueFormatter([3, 4])(3)).toBe('3');
  });
});
