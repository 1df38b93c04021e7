import { describe, expect, it } from 'vitest';
import { valueTicks } from '../../src/layout/axis.js';
import type { TextStyle } from '../../src/style/types.js';
import { env } from '../helpers.js';

const style: TextStyle = { size: 12, weight: 'regular', color: '#000000' };

describe('whole-number ticks for whole-number formats', () => {
  it('a count axis formatted ",d" never gets a tick between whole numbers, at any length', () => {
    for (const hi of [1, 3, 7, 25]) {
      for (const length of [80, 200, 400, 900]) {
        const t = valueTicks(0, hi, length, 'vertical', style, env.measure, ',d');
        expect(t.ticks.every(Number.isInteger), `[0, ${hi}] over ${length} px: ${t.ticks}`).toBe(true);
        expect(t.domain[1]).toBeGreaterThanOrEqual(hi);
      }
    }
  });

  it('without a whole-number format the same axis may step by halves (the check above can fail)', () => {
    const t = valueTicks(0, 3, 400, 'vertical', style, env.measure);
    expect(t.ticks.every(Number.isInteger)).toBe(false);
  });
});
