import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { inGamut, oklabLightness, oklchToRgb } from '../../src/color/oklab.js';
import { divergingRampFrom, maxChroma, sequentialRampFrom, snapToHex } from '../../src/color/ramps.js';
import { hexToRgb, rgbToHex } from '../../src/color/srgb.js';
import { runs } from '../helpers.js';

const lightness = (hex: string) => oklabLightness(hexToRgb(hex));

describe('ramp building blocks', () => {
  it('finds the gamut edge: the largest chroma is displayable and a little more is not', () => {
    fc.assert(fc.property(fc.double({ min: 0.1, max: 0.95, noNaN: true }), fc.double({ min: 0, max: 359.99, noNaN: true }), (l, h) => {
      const c = maxChroma(l, h);
      expect(inGamut(oklchToRgb([l, c, h]))).toBe(true);
      expect(inGamut(oklchToRgb([l, c + 1e-4, h]))).toBe(false);
    }), { numRuns: runs(300) });
  });

  it('snaps to the 8-bit colour nearest in lightness, never farther than plain rounding', () => {
    const target = fc.tuple(fc.double({ min: 0.2, max: 0.97, noNaN: true }), fc.double({ min: 0, max: 0.2, noNaN: true }), fc.double({ min: 0, max: 359.99, noNaN: true }));
    fc.assert(fc.property(target, ([l, c, h]) => {
      const lch: [number, number, number] = [l, Math.min(c, maxChroma(l, h)), h];
      const error = Math.abs(lightness(snapToHex(lch)) - l);
      expect(error).toBeLessThanOrEqual(Math.abs(lightness(rgbToHex(oklchToRgb(lch))) - l));
      // One 8-bit step moves OKLab lightness by at most about 0.004; the best of 27 does far better.
      expect(error).toBeLessThan(0.002);
    }), { numRuns: runs(300) });
  });
});

describe('ramps from a recipe', () => {
  it('puts the anchor, unchanged, at its step of a sequential ramp, lightness falling throughout', () => {
    const ramp = sequentialRampFrom({ anchor: '#2a7a3b', steps: 7, anchorStep: 4, lightest: 0.95 });
    expect(ramp).toHaveLength(7);
    expect(ramp[4]).toBe('#2a7a3b');
    for (let i = 1; i < ramp.length; i++) expect(lightness(ramp[i]!)).toBeLessThan(lightness(ramp[i - 1]!));
  });

  it('builds a diverging ramp with a grey midpoint and mirrored lightness', () => {
    const ramp = divergingRampFrom({ low: '#7b3294', high: '#2a7a3b', steps: 7, middle: 0.93, ends: 0.45 });
    expect(ramp).toHaveLength(7);
    const [r, g, b] = hexToRgb(ramp[3]!);
    expect(r === g && g === b).toBe(true);
    for (let i = 0; i < 3; i++) expect(Math.abs(lightness(ramp[i]!) - lightness(ramp[6 - i]!))).toBeLessThan(0.003);
  });
});
