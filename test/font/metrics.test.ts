import * as fontkit from 'fontkit';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { FontMetrics } from '../../src/font/metrics.js';
import { createNodeEnv } from '../../src/io/node-env.js';
import { env, root } from '../helpers.js';

// fontkit (a general-purpose font engine from npm) reads the TTF that resvg draws with; the
// committed metrics must agree with it, so layout measures exactly what gets drawn.
const faces = [
  ['regular', 'SourceSans3-Regular.ttf'],
  ['semibold', 'SourceSans3-Semibold.ttf'],
] as const;

describe('font metrics extracted from the bundled TTF', () => {
  for (const [weight, file] of faces) {
    const font = fontkit.openSync(join(root, 'node_modules', 'source-sans', 'TTF', file)) as fontkit.Font;
    const metrics = JSON.parse(readFileSync(join(root, 'templates', 'fonts', `source-sans-3-${weight}.metrics.json`), 'utf8')) as FontMetrics;

    it(`${weight}: every code point's advance matches the font`, () => {
      const advances = new Map<number, number>();
      for (let i = 0; i < metrics.advances.length; i += 2) advances.set(metrics.advances[i]!, metrics.advances[i + 1]!);
      expect(advances.size).toBe(font.characterSet.length);
      for (const cp of font.characterSet) expect(advances.get(cp)).toBe(font.glyphForCodePoint(cp).advanceWidth);
      expect([metrics.unitsPerEm, metrics.ascent, metrics.descent]).toEqual([font.unitsPerEm, font.ascent, font.descent]);
    });

    it(`${weight}: measured label widths equal fontkit's kerned layout`, () => {
      const labels = ['North pier', 'Lighthouse steps', 'AVATAR Ty.', "Sailmakers' slip", 'Water, Tarn & Yew', '−4,380', 'Café Über', 'Old Town Children\'s Library'];
      for (const label of labels) {
        const run = font.layout(label, { kern: true, liga: false, calt: false } as unknown as string[]);
        const expected = run.positions.reduce((s, p) => s + p.xAdvance, 0) * 12 / font.unitsPerEm;
        expect(env.measure.width(label, 12, weight)).toBeCloseTo(expected, 6);
      }
    });
  }

  it('covers all printable ASCII in both faces (the missing-glyph check skips such text)', () => {
    for (const [weight, file] of faces) {
      const font = fontkit.openSync(join(root, 'node_modules', 'source-sans', 'TTF', file)) as fontkit.Font;
      for (let cp = 0x20; cp < 0x7f; cp++) expect(font.hasGlyphForCodePoint(cp), `${weight} U+${cp.toString(16)}`).toBe(true);
    }
  });

  it('knows which characters the font cannot draw (no fallback package installed)', () => {
    const bare = createNodeEnv(undefined, { findPackage: () => undefined });
    expect(bare.measure.missing('Hafen 港', 'regular')).toEqual(['港']);
  });
});
