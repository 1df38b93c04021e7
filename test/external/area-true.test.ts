import { describe, expect, it } from 'vitest';
import { areaRadius } from '../../src/derive/point-size.js';
import { sizeLegendValues } from '../../src/layout/legend.js';

describe('the area-true size rule', () => {
  it('radius ∝ √value: a 4× value gives a 2× radius and a 4× area (common practice)', () => {
    // Common practice for proportional symbols: area, not radius, proportional to the value.
    // Flannery (1971) proposed an exponent of about 0.57 to offset perceived underestimation;
    // it is not taken here, so areas stay true (a 4× value would otherwise get about 2.2× radius).
    const small = areaRadius(25, 100, 20);
    const large = areaRadius(100, 100, 20);
    expect(large / small).toBeCloseTo(2, 12);
    expect((Math.PI * large ** 2) / (Math.PI * small ** 2)).toBeCloseTo(4, 12);
    expect(large).toBe(20);
    expect(large / small).not.toBeCloseTo(4 ** 0.57, 2);
  });

  it('zero and non-positive values get no circle, never a negative or NaN radius', () => {
    expect(areaRadius(0, 100, 20)).toBe(0);
    expect(areaRadius(-4, 100, 20)).toBe(0);
    expect(areaRadius(5, 0, 20)).toBe(0);
  });

  it('the size legend\'s reference circles follow the same rule', () => {
    const values = sizeLegendValues(870, 20);
    expect(values.length).toBeGreaterThanOrEqual(2);
    for (const v of values) expect(areaRadius(v, 870, 20)).toBeCloseTo(20 * Math.sqrt(v / 870), 12);
  });
});
