import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { diff } from 'color-diff';
import { converter } from 'culori';
import { describe, expect, it } from 'vitest';
import { deltaE, minPairwiseDeltaE } from '../../src/color/distinct.js';
import { categoricalPalette, divergingRamp, maxCategorical, needsOutline, sequentialRamp, type PaletteFile } from '../../src/color/palette.js';
import { PUBLISHED_PALETTES, publishedPalette } from '../../src/color/published.js';
import { contrastRatio } from '../../src/color/wcag.js';
import { root } from '../helpers.js';

const file = JSON.parse(readFileSync(join(root, 'templates', 'palettes', 'tidewater.json'), 'utf8')) as PaletteFile;

describe('palette API', () => {
  it('gives the first n categorical colours for n classes', () => {
    expect(maxCategorical(file)).toBe(8);
    expect(categoricalPalette(file, 1)).toEqual([file.categorical[0]]);
    expect(categoricalPalette(file, 3)).toEqual(file.categorical.slice(0, 3));
    expect(categoricalPalette(file, 8)).toEqual(file.categorical);
  });

  it('refuses a class count it has no palette for', () => {
    for (const n of [0, 9, 2.5, -1, Number.NaN]) expect(() => categoricalPalette(file, n)).toThrow(RangeError);
  });

  it('finds ramps by name, and nothing for an unknown or inherited name', () => {
    expect(sequentialRamp(file, 'tide')).toHaveLength(9);
    expect(divergingRamp(file, 'ember-tide')).toHaveLength(11);
    for (const name of ['nope', 'constructor', '__proto__', 'toString']) {
      expect(sequentialRamp(file, name)).toBeUndefined();
      expect(divergingRamp(file, name)).toBeUndefined();
    }
  });

  it('measures the smallest pairwise ΔE00 over every pair, Infinity for fewer than two colours', () => {
    expect(minPairwiseDeltaE(['#206c89'])).toBe(Infinity);
    const [a, b, c] = ['#206c89', '#aa5830', '#80878d'];
    expect(minPairwiseDeltaE([a, b, c], 'deuteranopia')).toBe(Math.min(deltaE(a, b, 'deuteranopia'), deltaE(a, c, 'deuteranopia'), deltaE(b, c, 'deuteranopia')));
  });

  it('measures a deficiency on the simulated colours: red and green as a protanope sees them', () => {
    // REFERENCES §3 (Machado et al. 2009): protanopia turns #ff0000 into #6d5f00 and #00ff00
    // into #ffe500 (after 8-bit rounding, hence the tolerance).
    expect(minPairwiseDeltaE(['#ff0000', '#00ff00'], 'protanopia')).toBeCloseTo(deltaE('#6d5f00', '#ffe500'), 0);
  });
});

describe('published palettes', () => {
  // M. Okabe & K. Ito, Color Universal Design (J*Fly, 2002/2008) and B. Wong, Nature Methods
  // 8:441 (2011), as transcribed in ../shared/REFERENCES.md §4.
  const okabeIto: [string, number][] = [
    ['#000000', 21.0], ['#e69f00', 2.25], ['#56b4e9', 2.31], ['#009e73', 3.42],
    ['#f0e442', 1.32], ['#0072b2', 5.19], ['#d55e00', 3.87], ['#cc79a7', 3.06],
  ];

  it('offers Okabe–Ito under its name, in its published order', () => {
    expect(publishedPalette('okabe-ito')).toEqual(okabeIto.map(([hex]) => hex));
    expect(publishedPalette('constructor')).toBeUndefined();
  });

  it('flags exactly the Okabe–Ito colours below 3:1 on white as needing an outline (REFERENCES §4 contrast column)', () => {
    for (const [hex, contrast] of okabeIto) {
      expect(contrastRatio(hex, '#ffffff')).toBeCloseTo(contrast, 2);
      expect(needsOutline(hex, '#ffffff')).toBe(contrast < 3);
    }
  });

  it('reproduces the Okabe–Ito smallest ΔE00 for normal vision, 21.13 (orange–vermillion), in D50 Lab', () => {
    // REFERENCES §4 computed it with colorjs.io, whose Lab is D50: culori's D50 Lab and
    // color-diff's CIEDE2000 (an independent implementation) rebuild that figure.
    const lab = converter('lab');
    const labs = PUBLISHED_PALETTES['okabe-ito']!.map((hex) => {
      const c = lab(hex)!;
      return { hex, L: c.l, a: c.a, b: c.b };
    });
    let best = { d: Infinity, pair: '' };
    for (let i = 0; i < labs.length; i++) for (let j = i + 1; j < labs.length; j++) {
      const d = diff(labs[i]!, labs[j]!);
      if (d < best.d) best = { d, pair: `${labs[i]!.hex} ${labs[j]!.hex}` };
    }
    expect(best.d).toBeCloseTo(21.13, 2);
    expect(best.pair).toBe('#e69f00 #d55e00');
  });
});
