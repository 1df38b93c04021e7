import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { contrastRatio, relativeLuminance } from '../../src/style/contrast.js';
import type { Style } from '../../src/style/types.js';
import { root } from '../helpers.js';

describe('WCAG 2.x contrast', () => {
  // W3C, WCAG 2.2, glossary "relative luminance" and "contrast ratio"; worked values from
  // ../shared/REFERENCES.md §2 (computed from the formula; culori, chroma-js and wcag-contrast agree).
  const worked: [string, number, number][] = [
    ['#777777', 0.184475, 4.478089],
    ['#767676', 0.181164, 4.542225],
    ['#595959', 0.099899, 7.004729],
    ['#949494', 0.296138, 3.03347],
    ['#000000', 0, 21],
    ['#ffffff', 1, 1],
    ['#0072b2', 0.15249, 5.185446],
    ['#e69f00', 0.416193, 2.252288],
  ];
  for (const [fg, lum, ratio] of worked) {
    it(`${fg} on white: luminance ${lum}, contrast ${ratio}`, () => {
      expect(relativeLuminance(fg)).toBeCloseTo(lum, 6);
      expect(contrastRatio(fg, '#ffffff')).toBeCloseTo(ratio, 6);
      expect(contrastRatio('#ffffff', fg)).toBeCloseTo(ratio, 6);
    });
  }

  it('gives the same answer with the WCAG 2.0 threshold 0.03928 for every 8-bit level', () => {
    // REFERENCES §2: 10/255 is below both thresholds and 11/255 above both.
    for (let c = 0; c < 256; c++) {
      const s = c / 255;
      expect(s <= 0.04045).toBe(s <= 0.03928);
    }
  });
});

describe('default style colours', () => {
  const style = JSON.parse(readFileSync(join(root, 'templates', 'styles', 'report.json'), 'utf8')) as Style;

  it('every text colour reaches 4.5:1 on the background (WCAG 2.x SC 1.4.3)', () => {
    for (const t of Object.values(style.text)) expect(contrastRatio(t.color, style.background)).toBeGreaterThanOrEqual(4.5);
  });

  it('every bar fill and the zero line reach 3:1 on the background (WCAG 2.1 SC 1.4.11)', () => {
    for (const c of [style.palette.primary, style.palette.negative, style.palette.others, style.lines.zero]) {
      expect(contrastRatio(c, style.background)).toBeGreaterThanOrEqual(3);
    }
  });
});
