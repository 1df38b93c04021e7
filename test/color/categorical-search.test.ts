import { describe, expect, it } from 'vitest';
import { VISIONS } from '../../src/color/cvd.js';
import { deltaE, minPairwiseDeltaE } from '../../src/color/distinct.js';
import { searchCategorical, type CategoricalInputs } from '../../src/color/categorical-search.js';
import { oklabLightness, rgbToOklch } from '../../src/color/oklab.js';
import { hexToRgb } from '../../src/color/srgb.js';
import { contrastRatio } from '../../src/color/wcag.js';

// A small search, so the test is quick; the real recipe is in palette-derive.ts.
const inputs: CategoricalInputs = {
  background: '#ffffff', anchor: '#206c89', reserved: ['#80878d'], size: 5, minContrast: 3,
  lightness: [0.45, 0.85], chroma: [0.06, 0.19], seed: 7, starts: 2, iterations: 600, softness: 1,
};
const worst = (colours: string[]) => Math.min(...VISIONS.map((v) => Math.min(minPairwiseDeltaE(colours, v), ...colours.map((c) => deltaE(c, '#80878d', v)))));

describe('categorical search', () => {
  const found = searchCategorical(inputs);

  it('returns the anchor first and distinct colours', () => {
    expect(found).toHaveLength(5);
    expect(found[0]).toBe('#206c89');
    expect(new Set(found).size).toBe(5);
  });

  it('keeps every searched colour inside its constraints', () => {
    for (const c of found.slice(1)) {
      expect(contrastRatio(c, '#ffffff')).toBeGreaterThanOrEqual(3);
      // Snapping to 8 bits may move lightness and chroma slightly past the box edges.
      expect(oklabLightness(hexToRgb(c))).toBeGreaterThanOrEqual(0.45 - 0.005);
      expect(oklabLightness(hexToRgb(c))).toBeLessThanOrEqual(0.85 + 0.005);
      expect(rgbToOklch(hexToRgb(c))[1]).toBeGreaterThanOrEqual(0.06 - 0.005);
    }
  });

  it('is deterministic for a seed, and a different seed searches differently', () => {
    expect(searchCategorical(inputs)).toEqual(found);
    expect(searchCategorical({ ...inputs, seed: 8 })).not.toEqual(found);
  });

  it('raises the smallest difference above where its random starts left it', () => {
    const starts = searchCategorical({ ...inputs, iterations: 0 });
    expect(worst(found)).toBeGreaterThan(worst(starts));
  });
});
