import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { inGamut, oklchToRgb, rgbToOklch } from '../../src/color/oklab.js';
import { seededRandom } from '../../src/color/random.js';
import { fromLinearRgb, hexToRgb, rgbToHex, toLinearRgb } from '../../src/color/srgb.js';
import { runs } from '../helpers.js';

const channel = fc.integer({ min: 0, max: 255 });

describe('sRGB, linear RGB and OKLCH conversions', () => {
  it('round-trips every 8-bit colour through hex, linear RGB and OKLCH', () => {
    fc.assert(fc.property(channel, channel, channel, (r, g, b) => {
      const hex = rgbToHex([r / 255, g / 255, b / 255]);
      expect(hexToRgb(hex).map((v) => Math.round(v * 255))).toEqual([r, g, b]);
      expect(rgbToHex(fromLinearRgb(toLinearRgb(hexToRgb(hex))))).toBe(hex);
      const back = oklchToRgb(rgbToOklch(hexToRgb(hex)));
      expect(inGamut(back)).toBe(true);
      expect(rgbToHex(back)).toBe(hex);
    }), { numRuns: runs(500) });
  });

  it('puts white at OKLab lightness 1 and every grey at zero chroma', () => {
    expect(rgbToOklch(hexToRgb('#ffffff'))[0]).toBeCloseTo(1, 6);
    expect(rgbToOklch(hexToRgb('#000000'))[0]).toBeCloseTo(0, 6);
    for (let v = 0; v < 256; v += 17) expect(rgbToOklch([v / 255, v / 255, v / 255])[1]).toBeLessThan(1e-6);
  });

  it('refuses what is not a hex colour', () => {
    expect(() => hexToRgb('blue')).toThrow(TypeError);
  });
});

describe('seeded random numbers', () => {
  it('repeat for a seed, differ between seeds, and stay in [0, 1) with a mean near 1/2', () => {
    const take = (seed: number) => { const r = seededRandom(seed); return Array.from({ length: 10000 }, r); };
    const a = take(1);
    expect(take(1)).toEqual(a);
    expect(take(2).slice(0, 10)).not.toEqual(a.slice(0, 10));
    expect(a.every((x) => x >= 0 && x < 1)).toBe(true);
    expect(Math.abs(a.reduce((s, x) => s + x, 0) / a.length - 0.5)).toBeLessThan(0.01);
  });
});
