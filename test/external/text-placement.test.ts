import pixelmatch from 'pixelmatch';
import { PNG } from 'pngjs';
import { describe, expect, it } from 'vitest';
import { outlineSvg } from '../../src/pipeline/render.js';
import { rasterize } from '../../src/raster/rasterize.js';
import { nodesOf } from '../../src/scene/walk.js';
import { demoBriefs, env, renderDemo } from '../helpers.js';

// The reference for where text lands is resvg itself, shaping the live <text> of our SVG from the
// bundled TTF (rustybuzz: kerning, ligatures). Our raster path draws text from our own measured
// advances and kerning pairs as glyph outlines; the two must agree to within a sliver of pixels,
// or layout decisions made from our measurements would not match what is drawn.
describe('text placement agrees with resvg shaping the same font', () => {
  for (const file of demoBriefs()) {
    it(`${file.split('/').pop()}: outline text and resvg's own text differ in under 0.1% of pixels`, async () => {
      const { result } = await renderDemo(file);
      // resvg gets the fallback faces the labels are drawn from too, and does its own font fallback, shaping and bidi.
      const measure = env.measureFor(result.style!);
      const fallbackFiles = nodesOf(result.scene!.root).flatMap((n) => (n.kind === 'text' ? measure.segments(n.text, n.weight).map((seg) => seg.face.file) : []));
      const fontFiles = [...new Set([...env.fontFiles(), ...fallbackFiles])];
      const live = PNG.sync.read(rasterize(result.svg!, { scale: 2, fontFiles }));
      const noText = PNG.sync.read(rasterize(result.svg!, { scale: 2, fontFiles: [] }));
      const outlines = PNG.sync.read(rasterize(outlineSvg(result.scene!, env, result.style), { scale: 2, fontFiles: [] }));
      const pixels = live.width * live.height;
      const differ = (a: PNG, b: PNG) => pixelmatch(a.data, b.data, undefined, a.width, a.height, { threshold: 0.1 }) / pixels;
      // The comparison means something only if text covers a fair share of the chart.
      expect(differ(live, noText)).toBeGreaterThan(0.005);
      expect(differ(live, outlines)).toBeLessThan(0.001);
    });
  }
});
