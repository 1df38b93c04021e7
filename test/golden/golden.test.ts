import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { basename, join } from 'node:path';
import pixelmatch from 'pixelmatch';
import { PNG } from 'pngjs';
import { describe, expect, it } from 'vitest';
import { outlineSvg } from '../../src/pipeline/render.js';
import { rasterize } from '../../src/raster/rasterize.js';
import { demoBriefs, env, renderDemo, root } from '../helpers.js';

// Goldens lock the gallery's output. They change only through `npm run golden:update`, on
// purpose; a mismatch writes expected | actual | diff images to test-output/golden/.
describe('golden gallery', () => {
  for (const file of demoBriefs()) {
    const id = basename(file, '.yaml');
    const dir = join(root, 'golden', id);

    it(`${id}: SVG is byte for byte the golden`, async () => {
      const { result } = await renderDemo(file);
      expect(result.svg).toBe(readFileSync(join(dir, `${id}.svg`), 'utf8'));
    });

    it(`${id}: PNG is pixel for pixel the golden (pixelmatch, threshold 0)`, async () => {
      const { result } = await renderDemo(file);
      const actual = PNG.sync.read(rasterize(outlineSvg(result.scene!, env, result.style), { scale: 2, fontFiles: [] }));
      const expected = PNG.sync.read(readFileSync(join(dir, `${id}.png`)));
      expect([actual.width, actual.height]).toEqual([expected.width, expected.height]);
      const diff = new PNG({ width: expected.width, height: expected.height });
      const mismatched = pixelmatch(expected.data, actual.data, diff.data, expected.width, expected.height, { threshold: 0 });
      if (mismatched > 0) {
        const out = join(root, 'test-output', 'golden', id);
        mkdirSync(out, { recursive: true });
        writeFileSync(join(out, 'expected.png'), PNG.sync.write(expected));
        writeFileSync(join(out, 'actual.png'), PNG.sync.write(actual));
        writeFileSync(join(out, 'diff.png'), PNG.sync.write(diff));
      }
      expect(mismatched).toBe(0);
    });
  }
});
