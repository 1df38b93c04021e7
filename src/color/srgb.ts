import { convertLrgbToRgb, convertRgbToLrgb, formatHex, parseHex } from 'culori/fn';

/** A colour as three sRGB channels, nominally in [0, 1]. */
export type Rgb = [number, number, number];

/** #rrggbb → sRGB channels in [0, 1]. Throws on anything that is not a hex colour. */
export function hexToRgb(hex: string): Rgb {
  const c = parseHex(hex);
  if (!c) throw new TypeError(`not a hex colour: ${hex}`);
  return [c.r, c.g, c.b];
}

/** sRGB channels (clamped to [0, 1]) → #rrggbb. */
export function rgbToHex([r, g, b]: Rgb): string {
  return formatHex({ mode: 'rgb', r, g, b });
}

/** The sRGB transfer function undone on each channel (IEC 61966-2-1): linear-light RGB. */
export function toLinearRgb([r, g, b]: Rgb): Rgb {
  const c = convertRgbToLrgb({ r, g, b });
  return [c.r, c.g, c.b];
}

/** The sRGB transfer function applied to each linear-light channel. */
export function fromLinearRgb([r, g, b]: Rgb): Rgb {
  const c = convertLrgbToRgb({ r, g, b });
  return [c.r, c.g, c.b];
}

/**
 * `colour` laid over `background` at `share` opacity, as one solid colour: the sRGB blend an SVG
 * renderer computes for `opacity` (SVG 1.1 compositing), without making an outline drawn with
 * it translucent too.
 */
export function tint(colour: string, background: string, share: number): string {
  const [f, b] = [hexToRgb(colour), hexToRgb(background)];
  return rgbToHex([0, 1, 2].map((i) => b[i]! + (f[i]! - b[i]!) * share) as Rgb);
}
