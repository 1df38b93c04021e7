import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { VISIONS } from '../../src/color/cvd.js';
import { deltaE, minPairwiseDeltaE } from '../../src/color/distinct.js';
import { NIGHTWATER_RECIPE } from '../../src/color/nightwater.js';
import { oklabLightness } from '../../src/color/oklab.js';
import type { PaletteFile } from '../../src/color/palette.js';
import { derivePalettes, paletteJson } from '../../src/color/palette-derive.js';
import { hexToRgb } from '../../src/color/srgb.js';
import { contrastRatio, MARK_CONTRAST, TEXT_CONTRAST } from '../../src/color/wcag.js';
import { DISTINCT_DE00 } from '../../src/style/check.js';
import type { Style } from '../../src/style/types.js';
import { root } from '../helpers.js';

const text = readFileSync(join(root, 'templates', 'palettes', 'nightwater.json'), 'utf8');
const file = JSON.parse(text) as PaletteFile;
const dark = JSON.parse(readFileSync(join(root, 'templates', 'styles', 'dark.json'), 'utf8')) as Style & { palette: Record<string, unknown> };
const tidewater = JSON.parse(readFileSync(join(root, 'templates', 'palettes', 'tidewater.json'), 'utf8')) as PaletteFile;
const lightness = (hex: string) => oklabLightness(hexToRgb(hex));

describe('the nightwater palette file (the dark style\'s)', () => {
  it('is exactly what re-running its recorded recipe derives, byte for byte', () => {
    expect(file.derivation.recipe).toEqual(NIGHTWATER_RECIPE);
    expect(paletteJson(derivePalettes(NIGHTWATER_RECIPE))).toBe(text);
  });

  it("is derived for the dark style's page, from its fills: primary first, negative and others reserved", () => {
    expect(file.background).toBe(dark.background);
    expect(file.categorical[0]).toBe(dark.palette.primary);
    expect(NIGHTWATER_RECIPE.categorical.reserved).toEqual([dark.palette.others, dark.palette.negative]);
    expect(dark.palette.categorical).toBe('nightwater');
  });

  // WCAG 2.1 SC 1.4.11 (3:1 for graphical objects); Machado et al. 2009 for the simulated visions.
  it(`keeps every categorical colour and the primary, negative and others fills at 3:1 on the dark page, and ΔE00 ${DISTINCT_DE00} apart for every vision`, () => {
    for (const c of [...file.categorical, dark.palette.primary as string, dark.palette.negative as string, dark.palette.others as string]) expect(contrastRatio(c, file.background), c).toBeGreaterThanOrEqual(MARK_CONTRAST);
    for (const v of VISIONS) {
      expect(minPairwiseDeltaE(file.categorical, v), v).toBeGreaterThanOrEqual(DISTINCT_DE00);
      const toReserved = Math.min(...file.categorical.flatMap((c) => NIGHTWATER_RECIPE.categorical.reserved.map((r) => deltaE(c, r, v))));
      expect(toReserved, v).toBeGreaterThanOrEqual(DISTINCT_DE00);
      expect(file.derivation.measured.categorical.minDeltaE00ToReserved[v]).toBe(Math.round(toReserved * 1e4) / 1e4);
    }
  });

  it('runs every ramp outwards from the page: faintest (nearest the page) first, each step lighter and further from it', () => {
    for (const ramp of Object.values(file.sequential)) {
      const ls = ramp.map(lightness);
      ls.slice(1).forEach((l, i) => expect(l).toBeGreaterThan(ls[i]!));
      const ratios = ramp.map((c) => contrastRatio(c, file.background));
      ratios.slice(1).forEach((r, i) => expect(r).toBeGreaterThan(ratios[i]!));
    }
    for (const ramp of Object.values(file.diverging)) {
      const half = (ramp.length - 1) / 2;
      for (let i = 0; i < half; i++) expect(lightness(ramp[i]!)).toBeGreaterThan(lightness(ramp[i + 1]!));
      for (let i = half; i < ramp.length - 1; i++) expect(lightness(ramp[i + 1]!)).toBeGreaterThan(lightness(ramp[i]!));
    }
  });

  it("keeps the faint end of each ramp at least as far from the page as tidewater's is from white, and its light end a text-grade 4.5:1", () => {
    for (const [name, m] of [...Object.entries(file.derivation.measured.sequential), ...Object.entries(file.derivation.measured.diverging)]) {
      const light = tidewater.derivation.measured.sequential[name] ?? tidewater.derivation.measured.diverging[name]!;
      expect(m.nearestDeltaE00FromBackground, name).toBeGreaterThanOrEqual(light.nearestDeltaE00FromBackground);
      expect(Math.max(...m.contrast), name).toBeGreaterThanOrEqual(TEXT_CONTRAST);
      for (const v of VISIONS) expect(m.minAdjacentDeltaE00[v], `${name} ${v}`).toBeGreaterThan(5);
    }
  });
});
