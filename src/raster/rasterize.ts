import type { Resvg as ResvgClass } from '@resvg/resvg-js';
import { createRequire } from 'node:module';
import { encodePng } from './png-encode.js';

/** Options for turning SVG into PNG. */
export interface RasterOptions {
  /** Pixels per CSS pixel. Default: 2. */
  scale: number;
  /**
   * Font files resvg may draw live `<text>` with. Charts from chartwright's raster path carry
   * text as outlines and need none; an empty list spares resvg rebuilding its font database.
   */
  fontFiles: string[];
}

/** resvg's native module, loaded on the first PNG: an SVG-only render never pays its load time. */
function loadResvg(): typeof ResvgClass {
  const require = createRequire(import.meta.url);
  return (require('@resvg/resvg-js') as { Resvg: typeof ResvgClass }).Resvg;
}

/**
 * The raster stage: SVG → PNG through resvg, with no system fonts. resvg renders the pixels;
 * they are encoded by `encodePng` (Node's zlib), which is faster than resvg's own encoder.
 */
export function rasterize(svg: string, options: RasterOptions): Buffer {
  const image = rasterPixels(svg, options);
  return encodePng(image.pixels, image.width, image.height);
}

/** resvg's pixels of an SVG, RGBA row by row, before PNG encoding (what `rasterize` encodes). */
export function rasterPixels(svg: string, options: RasterOptions): { pixels: Uint8Array; width: number; height: number } {
  const resvg = new (loadResvg())(svg, {
    fitTo: { mode: 'zoom', value: options.scale },
    font: { loadSystemFonts: false, fontFiles: options.fontFiles, defaultFontFamily: 'Source Sans 3' },
    shapeRendering: 2,
    textRendering: 1,
    imageRendering: 0,
  });
  const image = resvg.render();
  return { pixels: image.pixels, width: image.width, height: image.height };
}
