import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { VISIONS } from '../../src/color/cvd.js';
import { minPairwiseDeltaE } from '../../src/color/distinct.js';
import { greyLightness, greyscaleCategorical, minGreyGap, PRINT_GREYSCALE } from '../../src/color/greyscale-palette.js';
import { contrastRatio, MARK_CONTRAST } from '../../src/color/wcag.js';
import { DISTINCT_DE00 } from '../../src/style/check.js';
import type { Style } from '../../src/style/types.js';
import { root } from '../helpers.js';

const print = JSON.parse(readFileSync(join(root, 'templates', 'styles', 'print.json'), 'utf8')) as Style;

describe('the print style\'s colours in greyscale', () => {
  it('are exactly what the recorded greyscale derivation gives', () => {
    expect(print.palette.categorical).toEqual(greyscaleCategorical(PRINT_GREYSCALE));
    expect(PRINT_GREYSCALE.reserved).toEqual([print.palette.others, print.palette.negative]);
  });

  // Greyscale lightness is CIELAB L* (CIE 1976), the lightness a photocopy keeps; ΔL* of about 10
  // reads as a clearly different grey (common practice for print, no single published threshold).
  it('keep the first four categories at least 10 L* apart, the first five 9, all eight 3.5, and the fills 10', () => {
    const gaps = [2, 3, 4, 5, 6, 7, 8].map((k) => minGreyGap(print.palette.categorical.slice(0, k)));
    expect(gaps.slice(0, 3).every((g) => g >= 10)).toBe(true);
    expect(gaps[3]).toBeGreaterThanOrEqual(9);
    expect(gaps[6]).toBeGreaterThanOrEqual(3.5);
    expect(minGreyGap([print.palette.primary, print.palette.negative, print.palette.others])).toBeGreaterThanOrEqual(10);
  });

  it('still keep 3:1 on white and ΔE00 10 apart for every simulated vision (WCAG 2.1 SC 1.4.11; Machado et al. 2009)', () => {
    for (const c of print.palette.categorical) expect(contrastRatio(c, print.background), c).toBeGreaterThanOrEqual(MARK_CONTRAST);
    for (const v of VISIONS) expect(minPairwiseDeltaE(print.palette.categorical, v), v).toBeGreaterThanOrEqual(DISTINCT_DE00);
  });

  it('spread each prefix in lightness: the first two are the darkest and the lightest', () => {
    const ls = print.palette.categorical.map(greyLightness);
    expect(ls[0]).toBe(Math.min(...ls));
    expect(ls[1]).toBe(Math.max(...ls));
  });
});
