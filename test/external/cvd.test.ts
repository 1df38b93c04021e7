import { readFileSync } from 'node:fs';
import { filterDeficiencyProt, formatHex } from 'culori';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { DEFICIENCIES, simulate, type Deficiency } from '../../src/color/cvd.js';
import { ciede2000, rgbToLab } from '../../src/color/lab.js';
import { hexToRgb, rgbToHex } from '../../src/color/srgb.js';
import { DISTINCT_DE00 } from '../../src/style/check.js';
import type { Style } from '../../src/style/types.js';
import { root } from '../helpers.js';

describe('colour-vision-deficiency simulation', () => {
  // Machado, Oliveira & Fernandes, IEEE TVCG 15(6), 2009, severity 1.0 matrices on linear RGB;
  // check values from ../shared/REFERENCES.md §3 (computed from the matrices, cross-checked).
  const checks: [string, Record<Deficiency, string>][] = [
    ['#ff0000', { protanopia: '#6d5f00', deuteranopia: '#a39000', tritanopia: '#ff000f' }],
    ['#00ff00', { protanopia: '#ffe500', deuteranopia: '#efd63a', tritanopia: '#00f7d9' }],
    ['#0000ff', { protanopia: '#0059ff', deuteranopia: '#003dfb', tritanopia: '#006b96' }],
  ];
  for (const [input, expected] of checks) {
    it(`simulates ${input} as the published matrices give`, () => {
      for (const d of DEFICIENCIES) expect(rgbToHex(simulate(hexToRgb(input), d))).toBe(expected[d]);
    });
  }

  it("is why culori's deficiency filters are not used: they apply the matrices to gamma-encoded sRGB", () => {
    // culori 4.0.2 filterDeficiencyProt(1) turns #ff0000 into #271d00, not the published
    // #6d5f00 (REFERENCES §3). If a culori upgrade moves to linear RGB, switch cvd.ts to it.
    expect(formatHex(filterDeficiencyProt(1)({ mode: 'rgb', r: 1, g: 0, b: 0 }))).not.toBe('#6d5f00');
    expect(rgbToHex(simulate(hexToRgb('#ff0000'), 'protanopia'))).toBe('#6d5f00');
  });

  it('keeps greys grey (every matrix row sums to 1)', () => {
    for (const d of DEFICIENCIES) for (const g of ['#ffffff', '#808080', '#000000']) expect(rgbToHex(simulate(hexToRgb(g), d))).toBe(g);
  });
});

describe('the default palette under colour-vision deficiency', () => {
  const style = JSON.parse(readFileSync(join(root, 'templates', 'styles', 'report.json'), 'utf8')) as Style;
  const marks = [style.palette.primary, style.palette.negative, style.palette.others];

  it(`keeps every pair of bar fills at least ΔE00 ${DISTINCT_DE00} apart, for normal vision and each simulated deficiency`, () => {
    for (const vision of [undefined, ...DEFICIENCIES]) {
      const seen = marks.map((m) => rgbToLab(vision ? simulate(hexToRgb(m), vision) : hexToRgb(m)));
      for (let i = 0; i < seen.length; i++) for (let j = i + 1; j < seen.length; j++) {
        expect(ciede2000(seen[i]!, seen[j]!), `${marks[i]} vs ${marks[j]} (${vision ?? 'normal'})`).toBeGreaterThanOrEqual(DISTINCT_DE00);
      }
    }
  });
});
