import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { niceTicks } from '../../src/layout/ticks.js';
import { tickFormatter } from '../../src/layout/number-format.js';
import { runs } from '../helpers.js';

describe('property: ticks', () => {
  it('are ascending, evenly spaced, cover the range, and label distinctly (in en and de)', () => {
    const range = fc.tuple(fc.double({ min: -1e9, max: 1e9, noNaN: true }), fc.double({ min: 1e-6, max: 1e9, noNaN: true }), fc.integer({ min: 2, max: 10 }));
    fc.assert(fc.property(range, ([lo, span, m]) => {
      const hi = lo + span;
      const ticks = niceTicks(lo, hi, m, true);
      expect(ticks.length).toBeGreaterThanOrEqual(2);
      expect(ticks.length).toBeLessThanOrEqual(4 * m);
      const step = ticks[1]! - ticks[0]!;
      // Doubles near the ticks' magnitude are about 2.2e-16 of it apart; allow a few of those.
      const ulps = Math.max(...ticks.map(Math.abs)) * 2.2e-16 * 8;
      for (let i = 1; i < ticks.length; i++) {
        expect(ticks[i]!).toBeGreaterThan(ticks[i - 1]!);
        expect(Math.abs(ticks[i]! - ticks[i - 1]! - step)).toBeLessThanOrEqual(Math.abs(step) * 1e-9 + ulps);
      }
      // Loose labelling covers the data, up to float noise at the data's own magnitude.
      const slack = Math.max(Math.abs(lo), Math.abs(hi)) * 1e-12;
      expect(ticks[0]!).toBeLessThanOrEqual(lo + slack);
      expect(ticks[ticks.length - 1]!).toBeGreaterThanOrEqual(hi - slack);
      for (const locale of ['en', 'de'] as const) {
        const labels = ticks.map(tickFormatter(ticks, { locale }));
        expect(new Set(labels).size).toBe(labels.length);
      }
    }), { numRuns: runs(2000) });
  });
});
