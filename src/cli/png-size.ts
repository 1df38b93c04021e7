import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';

/**
 * The most pixels a PNG may have: 100 megapixels (400 MB of RGBA while it is drawn). A legal
 * 4000 × 4000 chart at --scale 8 would be 1,024 megapixels and peaked at 11.6 GiB.
 */
export const MAX_PNG_PIXELS = 100_000_000;

/** Why a chart of width × height CSS pixels cannot be drawn at `scale`, or undefined when it can. */
export function pngSizeProblem(width: number, height: number, scale: number, file: string): Diagnostic | undefined {
  const [w, h] = [width * scale, height * scale];
  if (w * h > MAX_PNG_PIXELS) {
    const fits = Math.sqrt(MAX_PNG_PIXELS / (width * height));
    return diagnostic('output.png-too-large', `the PNG would have ${Math.round((w * h) / 1e6)} megapixels (${width} × ${height} at scale ${scale}); the limit is ${MAX_PNG_PIXELS / 1e6} megapixels`, {
      file, path: '/size', found: `${Math.round(w)} × ${Math.round(h)} px`, expected: `at most ${MAX_PNG_PIXELS / 1e6} megapixels`,
      hint: `lower --scale (at most ${Math.floor(fits * 100) / 100} for this size) or the brief's size`,
    });
  }
  if (w < 1 || h < 1) {
    return diagnostic('output.png-too-small', `the PNG would be under 1 pixel on a side (${width} × ${height} at scale ${scale})`, {
      file, found: `scale ${scale}`, expected: `a scale of at least ${Math.ceil(1e4 / Math.min(width, height)) / 1e4}`, hint: 'use --scale 1 or 2 (the default)',
    });
  }
  return undefined;
}
