import { PNG } from 'pngjs';
import { describe, expect, it } from 'vitest';
import { createRequire } from 'node:module';
import { crc32 } from 'node:zlib';
import { crc32Table, encodePng } from '../../src/raster/png-encode.js';
import { rasterize } from '../../src/raster/rasterize.js';

const svg = '<svg xmlns="http://www.w3.org/2000/svg" width="40" height="30"><rect width="40" height="30" fill="#ffffff"/><rect x="5" y="5" width="20" height="10" fill="#206c89"/><circle cx="30" cy="20" r="6" fill="#aa5830"/></svg>';

describe('raster stage', () => {
  it('encodes the same pixels resvg\'s own PNG encoder writes (decoded by pngjs)', () => {
    const { Resvg } = createRequire(import.meta.url)('@resvg/resvg-js');
    const reference = PNG.sync.read(new Resvg(svg, { fitTo: { mode: 'zoom', value: 2 }, font: { loadSystemFonts: false } }).render().asPng());
    const ours = PNG.sync.read(rasterize(svg, { scale: 2, fontFiles: [] }));
    expect([ours.width, ours.height]).toEqual([80, 60]);
    expect(Buffer.compare(ours.data, reference.data)).toBe(0);
  });

  it('writes a valid PNG that pngjs decodes to the input pixels', () => {
    const rgba = new Uint8Array(3 * 2 * 4).map((_, i) => (i * 37) % 256);
    const decoded = PNG.sync.read(encodePng(rgba, 3, 2));
    expect([...decoded.data]).toEqual([...rgba]);
  });

  it('computes the same CRC-32 as zlib without it (for Node before 20.15)', () => {
    // "123456789" → 0xcbf43926 is the usual CRC-32 check value (from memory, unverified; zlib agrees below).
    expect(crc32Table(Buffer.from('123456789'))).toBe(0xcbf43926);
    const bytes = Buffer.from(Array.from({ length: 1000 }, (_, i) => (i * 131) % 256));
    expect(crc32Table(bytes)).toBe(crc32(bytes) >>> 0);
  });

  it('scales by --scale', () => {
    expect(PNG.sync.read(rasterize(svg, { scale: 1, fontFiles: [] })).width).toBe(40);
  });
});
