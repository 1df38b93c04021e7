import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { VISIONS } from '../../src/color/cvd.js';
import { deltaE, minPairwiseDeltaE } from '../../src/color/distinct.js';
import { oklabLightness, rgbToOklch } from '../../src/color/oklab.js';
import type { PaletteFile } from '../../src/color/palette.js';
import { derivePalettes, paletteJson, TIDEWATER_RECIPE } from '../../src/color/palette-derive.js';
import { hexToRgb } from '../../src/color/srgb.js';
import { contrastRatio } from '../../src/color/wcag.js';
import { DISTINCT_DE00 } from '../../src/style/check.js';
import type { Style } from '../../src/style/types.js';
import { root } from '../helpers.js';

const text = readFileSync(join(root, 'templates', 'palettes', 'tidewater.json'), 'utf8');
const file = JSON.parse(text) as PaletteFile;
const style = JSON.parse(readFileSync(join(root, 'templates', 'styles', 'report.json'), 'utf8')) as Style;
const { measured, recipe } = file.derivation;
const lightness = (hex: string) => oklabLightness(hexToRgb(hex));
const r4 = (x: number) => Math.round(x * 1e4) / 1e4;

describe('the tidewater palette file', () => {
  it('is exactly what re-running its recorded recipe derives, byte for byte', () => {
    expect(recipe).toEqual(TIDEWATER_RECIPE);
    expect(paletteJson(derivePalettes(recipe))).toBe(text);
  });

  it("keeps the report style's fills: primary first, negative and others reserved", () => {
    expect(file.categorical[0]).toBe(style.palette.primary);
    expect(recipe.categorical.reserved).toEqual([style.palette.others, style.palette.negative]);
    expect(file.background).toBe(style.background);
    expect(file.categorical).toHaveLength(8);
    expect(new Set(file.categorical).size).toBe(8);
  });

  it('records the smallest ΔE00 of every prefix k = 2..8 for every vision, as recomputed from the colours', () => {
    expect(measured.categorical.minDeltaE00ByPrefix.map((r) => r.k)).toEqual([2, 3, 4, 5, 6, 7, 8]);
    for (const row of measured.categorical.minDeltaE00ByPrefix) {
      for (const v of VISIONS) expect(row[v], `k=${row.k} ${v}`).toBe(r4(minPairwiseDeltaE(file.categorical.slice(0, row.k), v)));
    }
    for (const v of VISIONS) {
      const toReserved = Math.min(...file.categorical.flatMap((c) => recipe.categorical.reserved.map((r) => deltaE(c, r, v))));
      expect(measured.categorical.minDeltaE00ToReserved[v]).toBe(r4(toReserved));
    }
  });

  it(`keeps all 8 colours, and each from the reserved fills, at least ΔE00 ${DISTINCT_DE00} apart for every vision`, () => {
    for (const v of VISIONS) {
      expect(minPairwiseDeltaE(file.categorical, v), v).toBeGreaterThanOrEqual(DISTINCT_DE00);
      expect(measured.categorical.minDeltaE00ToReserved[v], v).toBeGreaterThanOrEqual(DISTINCT_DE00);
    }
  });

  it('orders the colours greedily: no later colour would make a prefix more distinct', () => {
    const gap = (prefix: string[], c: string) => Math.min(...prefix.flatMap((p) => VISIONS.map((v) => deltaE(p, c, v))));
    for (let k = 1; k < file.categorical.length; k++) {
      const prefix = file.categorical.slice(0, k);
      const chosen = gap(prefix, file.categorical[k]!);
      for (const later of file.categorical.slice(k + 1)) expect(chosen).toBeGreaterThanOrEqual(gap(prefix, later));
    }
  });

  it('gives every categorical colour at least 3:1 on the background, so none needs an outline (WCAG 2.1 SC 1.4.11)', () => {
    file.categorical.forEach((c, i) => {
      expect(contrastRatio(c, file.background)).toBeGreaterThanOrEqual(3);
      expect(measured.categorical.contrast[i]).toBe(r4(contrastRatio(c, file.background)));
    });
    expect(measured.categorical.outline).toEqual([]);
  });

  for (const [name, ramp] of Object.entries(file.sequential)) {
    it(`sequential ramp ${name}: lightness strictly falls, darkest ≥ 3:1, lightest clearly off the background`, () => {
      const ls = ramp.map(lightness);
      for (let i = 1; i < ls.length; i++) expect(ls[i]!).toBeLessThan(ls[i - 1]!);
      expect(contrastRatio(ramp[ramp.length - 1]!, file.background)).toBeGreaterThanOrEqual(3);
      // Common practice: a step the eye separates from the page at once (about 5 ΔE00 or more).
      expect(deltaE(ramp[0]!, file.background)).toBeGreaterThanOrEqual(5);
      expect(ramp[recipe.sequential[name]!.anchorStep]).toBe(recipe.sequential[name]!.anchor);
      expect(measured.sequential[name]!.oklabLightness).toEqual(ls.map(r4));
      expect(measured.sequential[name]!.contrast).toEqual(ramp.map((c) => r4(contrastRatio(c, file.background))));
      expect(measured.sequential[name]!.lightestDeltaE00FromBackground).toBe(r4(deltaE(ramp[0]!, file.background)));
    });
  }

  for (const [name, ramp] of Object.entries(file.diverging)) {
    it(`diverging ramp ${name}: grey midpoint, equal lightness steps on both sides, arms apart for every vision`, () => {
      const half = (ramp.length - 1) / 2;
      const mid = ramp[half]!;
      expect(mid.slice(1, 3)).toBe(mid.slice(3, 5));
      expect(mid.slice(3, 5)).toBe(mid.slice(5, 7));
      expect(rgbToOklch(hexToRgb(mid))[1]).toBeLessThan(1e-6);
      const ls = ramp.map(lightness);
      const step = (ls[half]! - ls[0]!) / half;
      for (let i = 1; i <= half; i++) {
        // Rounding to 8 bits moves OKLab lightness by about 0.001; steps are about 0.1.
        expect(Math.abs(ls[half]! - ls[half - i]! - i * step)).toBeLessThan(0.003);
        expect(Math.abs(ls[half]! - ls[half + i]! - i * step)).toBeLessThan(0.003);
      }
      for (const end of [ramp[0]!, ramp[ramp.length - 1]!]) expect(contrastRatio(end, file.background)).toBeGreaterThanOrEqual(3);
      for (const v of VISIONS) {
        const mirrored = Math.min(...ramp.slice(0, half).map((c, i) => deltaE(c, ramp[ramp.length - 1 - i]!, v)));
        expect(mirrored, v).toBeGreaterThanOrEqual(DISTINCT_DE00);
        expect(measured.diverging[name]!.minMirroredDeltaE00[v]).toBe(r4(mirrored));
      }
      expect(measured.diverging[name]!.oklabLightness).toEqual(ls.map(r4));
    });
  }
});
