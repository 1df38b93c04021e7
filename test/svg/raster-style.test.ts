import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { outlineSvg } from '../../src/pipeline/render.js';
import { rasterize } from '../../src/raster/rasterize.js';
import { env, renderDemo, root } from '../helpers.js';

const RULE = '<style>@supports (image-rendering:pixelated){image.raster{image-rendering:pixelated}}</style>';
const demo = (name: string) => renderDemo(join(root, 'demo-data', `${name}.yaml`));

// Chromium smooths an image marked only image-rendering="optimizeSpeed" (seen in the browser
// parity test: the dense layout's top rows of cells blurred into each other, 0.29 % of pixels).
describe('data rasters are drawn unsmoothed by browsers and by resvg', () => {
  it('a chart with a data raster carries the pixelated rule once; a chart without carries none', async () => {
    const dense = (await demo('water-meters')).result;
    expect(dense.svg!.split(RULE).length - 1).toBe(1);
    expect(dense.svg).toContain('image-rendering="optimizeSpeed"');
    expect((await demo('ferry-crossings')).result.svg).not.toContain(RULE);
  });

  it('resvg draws the same pixels with the browser rule as without it (it skips the at-rule)', async () => {
    const svg = outlineSvg((await demo('water-meters')).result.scene!, env);
    expect(svg).toContain(RULE);
    const withRule = rasterize(svg, { scale: 2, fontFiles: [] });
    expect(rasterize(svg.replace(RULE, ''), { scale: 2, fontFiles: [] }).equals(withRule)).toBe(true);
  });
});
